import { DOCUMENT, registerLocaleData } from '@angular/common';
import localeEnCa from '@angular/common/locales/en-CA';
import localeEnGb from '@angular/common/locales/en-GB';
import localeEs from '@angular/common/locales/es';
import localeEsMx from '@angular/common/locales/es-MX';
import localeFrCa from '@angular/common/locales/fr-CA';
import { inject, LOCALE_ID, REQUEST, type Provider } from '@angular/core';
import { localeOfHeader, pickLocale, type ReaderLocale } from '@shared/contracts/locales';

/** Angular's formatting data for every locale the app ships besides US English (built in). */
const LOCALES: Record<Exclude<ReaderLocale, 'en-US'>, unknown[]> = { 'en-CA': localeEnCa, 'en-GB': localeEnGb, es: localeEs, 'es-MX': localeEsMx, 'fr-CA': localeFrCa };
for (const [id, data] of Object.entries(LOCALES)) registerLocaleData(data, id);

export { pickLocale };

/**
 * Dates, numbers and money follow the reader's language through Angular's pipes. The server reads
 * Accept-Language and the browser its own languages, which name the same locale, so hydration agrees.
 */
export const provideReaderLocale: Provider = {
  provide: LOCALE_ID,
  useFactory: () => {
    const request = inject(REQUEST, { optional: true });
    if (request) return localeOfHeader(request.headers.get('accept-language'));
    const nav = inject(DOCUMENT).defaultView?.navigator;
    return pickLocale(nav?.languages ?? []);
  },
};
