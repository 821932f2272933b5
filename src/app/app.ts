import { ApplicationRef, ChangeDetectionStrategy, Component, DOCUMENT, PLATFORM_ID, ViewEncapsulation, inject } from '@angular/core';
import { isPlatformBrowser } from '@angular/common';
import { Shell } from './core/layout/shell';

@Component({
  selector: 'app-root',
  imports: [Shell],
  template: '<app-shell />',
  // The brand's font faces, declared with the root component (not in the global stylesheet): a page's component
  // styles arrive inline with its HTML, while the global sheet loads after first paint, and a face declared
  // again there would be swapped in late and move the whole page (see src/fonts.css).
  styleUrl: '../fonts.css',
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
