/** Locales whose number and date formats ship with the app; any other reader gets US English. */
export const READER_LOCALES = ['en-US', 'en-CA', 'en-GB', 'es', 'es-MX', 'fr-CA'] as const;
export type ReaderLocale = (typeof READER_LOCALES)[number];

/**
 * The best supported locale for a list of language tags, best first (e.g. Accept-Language split on commas):
 * the first tag the app ships wins, a region falls back to its language, and anything else is US English.
 * The server renders, and keeps rendered pages, per this answer; the browser picks the same one.
 */
export function pickLocale(tags: readonly string[]): ReaderLocale {
  for (const raw of tags) {
    const tag = raw.trim().split(';')[0]!;
    if (!tag) continue;
    if (/^en(-US)?$/i.test(tag)) return 'en-US';
    const exact = READER_LOCALES.find((l) => l.toLowerCase() === tag.toLowerCase());
    if (exact) return exact;
    const language = READER_LOCALES.find((l) => l !== 'en-US' && l.toLowerCase() === tag.split('-')[0]!.toLowerCase());
    if (language) return language;
  }
  return 'en-US';
}

/** The reader's locale from an Accept-Language header (missing → US English). */
export const localeOfHeader = (acceptLanguage: string | null | undefined): ReaderLocale => pickLocale((acceptLanguage ?? '').split(','));
