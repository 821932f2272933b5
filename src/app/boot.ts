import { bootstrapApplication } from '@angular/platform-browser';
import { appConfig } from './app.config';
import { App } from './app';

/** Starts the app on the server's page (hydration); main.ts decides when. */
export function boot(): Promise<unknown> {
  return bootstrapApplication(App, appConfig);
}
