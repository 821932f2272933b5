import { HttpXsrfTokenExtractor, provideHttpClient, withFetch, withInterceptors } from '@angular/common/http';
import { ApplicationConfig, inject, provideAppInitializer, provideBrowserGlobalErrorListeners } from '@angular/core';
import { provideClientHydration, withEventReplay, withIncrementalHydration } from '@angular/platform-browser';
import { provideRouter, withComponentInputBinding, withInMemoryScrolling } from '@angular/router';
import { routes } from './app.routes';
import { provideReaderLocale } from './core/locale';
import { Session } from './core/session';
import { forwardCookiesOnServer } from './core/ssr-cookie-interceptor';
import { pageUnavailableOnServer } from './core/ssr-unavailable-interceptor';
import { XsrfTokenFromCookie } from './core/xsrf-token';

export const appConfig: ApplicationConfig = {
  providers: [
    provideBrowserGlobalErrorListeners(),
    provideReaderLocale,
    provideRouter(routes, withComponentInputBinding(), withInMemoryScrolling({ scrollPositionRestoration: 'enabled' })),
    provideHttpClient(withFetch(), withInterceptors([forwardCookiesOnServer, pageUnavailableOnServer])),
    // After provideHttpClient, so it replaces Angular's one-name cookie reader.
    { provide: HttpXsrfTokenExtractor, useClass: XsrfTokenFromCookie },
    // Incremental: `@defer (hydrate …)` blocks keep the server's DOM until their trigger (the catalogue page).
    provideClientHydration(withEventReplay(), withIncrementalHydration()),
    provideAppInitializer(() => inject(Session).load()),
  ],
};
