import { ChangeDetectionStrategy, Component, input } from '@angular/core';

/**
 * Baleproof's mark: the end of a round bale (its spiral of hay) with a sampling probe driven into its core.
 * The same drawing is public/favicon.svg; DEVELOPERS.md describes how to use it.
 */
@Component({
  selector: 'app-brand-mark',
  template: `
    <svg [attr.width]="size()" [attr.height]="size()" viewBox="0 0 32 32" aria-hidden="true" focusable="false">
      <circle cx="16" cy="16" r="14.5" fill="var(--bp-tag, #fffdf7)" stroke="currentColor" stroke-width="2" />
      <path [attr.d]="spiral" fill="none" stroke="currentColor" stroke-width="1.6" stroke-linecap="round" />
      <path d="M29.5 4.5 L17.2 14.8" stroke="var(--bp-sorrel, #9a4a22)" stroke-width="2.6" stroke-linecap="round" />
      <circle cx="16.4" cy="15.6" r="2.1" fill="var(--bp-sorrel, #9a4a22)" />
    </svg>
  `,
  styles: ':host { display: inline-flex; line-height: 0; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BrandMark {
  readonly size = input(28);
  /** An Archimedean spiral of 2.6 turns, as a bale's windings look from its end. */
  protected readonly spiral = SPIRAL;
}

const SPIRAL =
  'M14.87 17.13L14.55 16.95L14.26 16.69L14.02 16.35L13.86 15.93L13.78 15.47L13.81 14.97L13.96 14.47L14.22 13.98L14.60 13.55L15.08 13.18L15.66 12.92L16.30 12.78L16.99 12.78L17.69 12.93L18.37 13.23L18.99 13.68L19.52 14.28L19.93 14.99L20.18 15.80L20.27 16.68L20.17 17.58L19.88 18.46L19.40 19.29L18.74 20.03L17.92 20.63L16.96 21.05L15.92 21.28L14.82 21.28L13.72 21.06L12.66 20.60L11.69 19.92L10.87 19.03L10.23 17.97L9.82 16.78L9.65 15.50L9.75 14.19L10.13 12.89L10.78 11.68L11.68 10.60L12.80 9.72L14.10 9.07L15.54 8.69L17.05 8.62L18.57 8.85L20.04 9.41L21.39 10.26L22.55 11.40L23.47 12.77L24.10 14.32L24.41 16.00L24.37 17.73L23.97 19.45L23.22 21.07L22.13 22.53L20.75 23.75L19.13 24.68L17.32 25.27L15.40 25.48L13.46 25.30L11.56 24.71L9.80 23.74L8.26 22.40L7.00 20.77L6.09 18.88L5.58 16.82L5.49 14.67L5.85 12.52L6.65 10.47L7.86 8.60L9.45 6.99L11.36 5.73L13.51 4.86L15.82 4.46L18.19 4.52L20.52 5.08L22.72 6.11L24.68 7.59L26.32 9.45';
