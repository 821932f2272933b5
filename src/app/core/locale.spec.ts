import { pickLocale } from './locale';

describe('pickLocale', () => {
  // RFC 4647 lookup (common practice): the first tag the app supports wins; a region falls back to its language.
  it('takes the first supported tag from an Accept-Language list', () => {
    expect(pickLocale(['fr-CA', 'en;q=0.8'])).toBe('fr-CA');
    expect(pickLocale(['de-DE', 'en-GB;q=0.9'])).toBe('en-GB');
    expect(pickLocale(['es-AR'])).toBe('es');
  });
  it('falls back to US English', () => {
    expect(pickLocale([])).toBe('en-US');
    expect(pickLocale(['ja-JP'])).toBe('en-US');
    expect(pickLocale(['en-US', 'en-GB'])).toBe('en-US');
  });
});
