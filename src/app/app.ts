import { ApplicationRef, ChangeDetectionStrategy, Component, DOCUMENT, PLATFORM_ID, ViewEncapsulation, inject } from '@angular/core';
import { isPlatformBrowser } from '@angular/common';
import { Shell } from './core/layout/shell';

@Component({
  selector: 'app-root',
  imports: [Shell],
  template: '<app-shell />',
  // The brand's font faces and the global styles (theme, tokens, base rules), declared with the root component:
  // component styles arrive inline with each server-rendered page, so there is no stylesheet to fetch after
  // first paint, which made the browser restyle and lay out the whole page again (about 40 ms on the catalogue,
  // 4 times that on Lighthouse's phone) and held back its first paint (see src/fonts.css).
  styleUrls: ['../fonts.css', '../styles.scss'],
  encapsulation: ViewEncapsulation.None,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  constructor() {
    // Once the browser has hydrated the server's page and settled, mark the document as interactive.
    // Input typed into a server-rendered field before then is not seen by its form; end-to-end tests
    // (and anything else that drives the page) wait for this mark after a full page load.
    if (isPlatformBrowser(inject(PLATFORM_ID))) {
      const document = inject(DOCUMENT);
      void inject(ApplicationRef)
        .whenStable()
        .then(() => document.documentElement.setAttribute('data-interactive', ''));
    }
  }
}
