import { bootstrapApplication } from '@angular/platform-browser';
import { appConfig } from './app/app.config';
import { App } from './app/app';

// Zod would probe for eval (new Function) to compile fast parsers; the pages' Content-Security-Policy forbids
// eval, so the probe only raises a violation report. Parse without it in the browser: zod reads its settings
// from this global (what `z.config({ jitless: true })` writes), which keeps zod out of the first bundle.
const zodGlobal = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
(zodGlobal.__zod_globalConfig ??= {}).jitless = true;

bootstrapApplication(App, appConfig)
  .catch((err) => console.error(err));
