import { z } from 'zod';

/*
 * Text people type into Baleproof. PostgreSQL refuses NUL bytes; other control characters and the
 * Unicode bidirectional controls (U+202A–U+202E, U+2066–U+2069, "Trojan Source", CVE-2021-42574) let
 * a title look different from what it says, or start new lines in the e-mails that quote it.
 */

/** C0 controls except tab and line feed, DEL and the C1 controls. */
const CONTROL = /[\u0000-\u0008\u000B-\u001F\u007F-\u009F]/;
const BIDI_CONTROL = /[\u202A-\u202E\u2066-\u2069]/;
const LINE_BREAK = /[\n\u2028\u2029]/;

interface Length {
  /** Fewest characters after trimming (0 = may be empty). */
  min?: number;
  minMessage?: string;
}

/** Free text of up to `max` characters that may span lines (descriptions, notes); CRLF becomes LF. */
export const multiLineText = (label: string, max: number, { min = 0, minMessage = `${label} is required.` }: Length = {}) =>
  z
    .string({ error: `${label} is required.` })
    .transform((s) => s.replace(/\r\n?/g, '\n'))
    .pipe(
      z
        .string()
        .trim()
        .min(min, minMessage)
        .max(max, `${label}: use at most ${max} characters.`)
        .refine((s) => !CONTROL.test(s), `${label}: remove the control characters (invisible characters such as NUL).`)
        .refine((s) => !BIDI_CONTROL.test(s), `${label}: remove the text-direction control characters.`),
    );

/** One line of text (titles, names, search words): no line breaks or tabs either. */
export const singleLineText = (label: string, max: number, length: Length = {}) =>
  multiLineText(label, max, length).refine((s) => !LINE_BREAK.test(s) && !s.includes('\t'), `${label}: use a single line (no line breaks).`);
