import { multiLineText, singleLineText } from './text';

// Characters refused: NUL (PostgreSQL text cannot hold it, "invalid byte sequence", SQLSTATE 22021),
// C0/C1 controls, and the bidi embedding/override/isolate controls listed by Unicode UAX #9 and
// CVE-2021-42574 ("Trojan Source").
describe('text schemas', () => {
  const title = singleLineText('Title', 140);
  const description = multiLineText('Description', 2000);

  it('keeps ordinary text, trimmed, with accents and dashes', () => {
    expect(title.parse('  Alfalfa, 2nd cutting — Prés du Lac ')).toBe('Alfalfa, 2nd cutting — Prés du Lac');
  });

  it('refuses NUL and other control characters, naming the field', () => {
    for (const bad of ['Hay\u0000', 'Hay\u0007bell', 'Hay\u001b[31m', 'Hay\u0085']) {
      const result = title.safeParse(bad);
      expect(result.success).toBe(false);
      expect(result.error!.issues[0]!.message).toMatch(/^Title: /);
    }
  });

  it('refuses bidi controls that make a title read differently', () => {
    for (const cp of [0x202a, 0x202b, 0x202c, 0x202d, 0x202e, 0x2066, 0x2067, 0x2068, 0x2069]) {
      expect(title.safeParse(`Timothy ${String.fromCodePoint(cp)}yrrah`).success).toBe(false);
      expect(description.safeParse(`x${String.fromCodePoint(cp)}y`).success).toBe(false);
    }
  });

  it('refuses line breaks in one-line fields (they would forge lines in e-mails) but keeps them in descriptions', () => {
    for (const bad of ['Hay\r\nBcc: all@example.com', 'Hay\nSee attached', 'Hay\rX', 'Hay\u2028X', 'Hay\tX']) expect(title.safeParse(bad).success).toBe(false);
    expect(description.parse('Line one\r\nLine two')).toBe('Line one\nLine two');
  });

  it('measures the length after trimming', () => {
    expect(title.safeParse('x'.repeat(141)).success).toBe(false);
    expect(title.safeParse(` ${'x'.repeat(140)} `).success).toBe(true);
  });
});
