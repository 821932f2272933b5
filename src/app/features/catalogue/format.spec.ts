import { registerLocaleData } from '@angular/common';
import localeEsMx from '@angular/common/locales/es-MX';
import localeFrCa from '@angular/common/locales/fr-CA';
import { cuttingLabel, distanceLabel, dollars, fixed, inLocale } from './format';

describe('distanceLabel', () => {
  // common practice: a distance that rounds to zero is said as "under 1 mi" rather than "0 mi".
  it('says "under 1 mi" for a lot in the same town', () => {
    expect(distanceLabel(0)).toBe('under 1 mi');
    expect(distanceLabel(0.4)).toBe('under 1 mi');
  });
  it('rounds other distances to whole miles', () => {
    expect(distanceLabel(1.2)).toBe('1 mi');
    expect(distanceLabel(148.6)).toBe('149 mi');
  });
  it('says nothing when no distance is known', () => {
    expect(distanceLabel(null)).toBe('');
  });
});

describe('cuttingLabel', () => {
  // English ordinals (common practice): 1st, 2nd, 3rd, 4th, 11th, 12th, 13th, 21st.
  it('names cuttings with English ordinals', () => {
    expect([1, 2, 3, 4, 11, 12, 13, 21].map(cuttingLabel)).toEqual([
      '1st cutting', '2nd cutting', '3rd cutting', '4th cutting', '11th cutting', '12th cutting', '13th cutting', '21st cutting',
    ]);
  });
});

describe('fixed and dollars in the reader\'s locale', () => {
  // Unicode CLDR number formats: French (Canada) groups with a no-break space and uses a decimal comma and writes
  // US dollars "$ US" after the amount; Spanish (Mexico) and US English group with a comma and use a decimal point.
  beforeAll(() => {
    registerLocaleData(localeFrCa, 'fr-CA');
    registerLocaleData(localeEsMx, 'es-MX');
  });

  it('writes decimals and thousands as the locale does', () => {
    expect(fixed(1234.5, 1)).toBe('1,234.5');
    expect(fixed(1234.5, 1, 'fr-CA')).toMatch(/^1[\u00a0\u202f]234,5$/);
    expect(fixed(1234.5, 1, 'es-MX')).toBe('1,234.5');
    expect(fixed(null, 1, 'fr-CA')).toBe('—');
  });

  it('writes money in the locale through the one money formatter', () => {
    expect(dollars(123450, 2)).toBe('$1,234.50');
    expect(inLocale('fr-CA').dollars(123450, 2)).toMatch(/^1[\u00a0\u202f]234,50[\u00a0\u202f]\$[\u00a0\u202f]US$/);
  });
});
