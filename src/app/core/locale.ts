import { DOCUMENT, registerLocaleData } from '@angular/common';
import localeEnCa from '@angular/common/locales/en-CA';
import localeEnGb from '@angular/common/locales/en-GB';
import localeEs from '@angular/common/locales/es';
import localeEsMx from '@angular/common/locales/es-MX';
import localeFrCa from '@angular/common/locales/fr-CA';
import { inject, LOCALE_ID, REQUEST, type Provider } from '@angular/core';

/** Locales whose number and date formats ship with the app; any other reader gets US English. */
const LOCALES: Record<string, unknown[]> = { 'en-CA': localeEnCa, 'en-GB': localeEnGb, es: localeEs, 'es-MX': localeEsMx, 'fr-CA': localeFrCa };
for (const [id, data] of Object.entries(LOCALES)) registerLocaleData(data, id);

/** The best supported locale for a list of language tags, best first (e.g. from Accept-Language). */
export function pickLocale(tags: readonly string[]): string {
  for (const raw of tags) {
    const tag = raw.trim().split(';')[0]!;
    if (!tag) continue;
    if (/^en(-US)?$/i.test(tag)) return 'en-US';
    const exact = Object.keys(LOCALES).find((l) => l.toLowerCase() === tag.toLowerCase());
    if (exact) return exact;
    const language = Object.keys(LOCALES).find((l) => l.toLowerCase() === tag.split('-')[0]!.toLowerCase());
    if (language) return language;
  }
  return 'en-US';
}

/**
 * Dates, numbers and money follow the reader's language through Angular's pipes. The server reads
 * Accept-Language and the browser its own languages, which name the same locale, so hydration agrees.
 */
export const provideReaderLocale: Provider = {
  provide: LOCALE_ID,
  useFactory: () => {
    const request = inject(REQUEST, { optional: true });
    if (request) return pickLocale((request.headers.get('accept-language') ?? '').split(','));
    const nav = inject(DOCUMENT).defaultView?.navigator;
    return pickLocale(nav?.languages ?? []);
  },
};
