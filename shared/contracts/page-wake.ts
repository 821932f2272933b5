/**
 * Pages whose server render is whole for reading and made to be used before the app's code runs: the
 * catalogue. Its filters search without scripts on wide screens, what is typed or chosen before the app
 * wakes is kept (src/app/core/keep-typed-value.ts), a press on its forms is held (src/app/core/wake/held-forms.ts),
 * and a click on anything the app handles is replayed once it runs (Angular's event replay).
 *
 * On such a page the browser starts the app at the visitor's first sign of use, not at load
 * (src/app/core/wake/wake-on-use.ts), and the server asks the browser to fetch the app's code while idle
 * (server/middleware/page-prefetch-hints.ts), so the first touch waits for the app to start, not for the network.
 */
export function pageWaitsForUse(pathname: string): boolean {
  return pathname === '/hay' || pathname === '/hay/';
}
