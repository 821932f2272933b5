import { pageWaitsForUse } from '@shared/contracts/page-wake';
import { tabHasComparedLots } from './app/features/catalogue/lot-compare/compare-storage';
import { holdServerFormSubmits } from './app/core/wake/held-forms';
import { startOnFirstUse } from './app/core/wake/wake-on-use';

// Zod would probe for eval (new Function) to compile fast parsers; the pages' Content-Security-Policy forbids
// eval, so the probe only raises a violation report. Parse without it in the browser: zod reads its settings
// from this global (what `z.config({ jitless: true })` writes), which keeps zod out of the first bundle.
const zodGlobal = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
(zodGlobal.__zod_globalConfig ??= {}).jitless = true;

// This file is all the page runs at load: the app itself (Angular, the router, the pages) is one import away.
// Called once: at once, or by startOnFirstUse, which calls it once.
function start(): void {
  import('./app/boot').then((m) => m.boot()).catch((err) => console.error(err));
}

// A page made to be used before the app runs (the catalogue) waits for the visitor's first sign of use; its
// code is fetched meanwhile while the browser is idle (prefetch hints from the server). Until its forms are
// live, their submits are held rather than reloading the page. Every other page starts the app at once.
if (pageWaitsForUse(location.pathname)) {
  holdServerFormSubmits(document);
  if (tabHasComparedLots(() => sessionStorage)) start();
  else startOnFirstUse(window, start);
} else {
  start();
}
