import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import type { PhotoView } from '@shared/contracts/lots';

/** Lot photos: a large view with responsive WebP sources and a row of thumbnails. */
@Component({
  selector: 'app-lot-gallery',
  template: `
    @if (current(); as photo) {
      <figure class="main">
        <img [src]="src(photo, 1600)" [attr.srcset]="srcset(photo)" sizes="(max-width: 800px) 100vw, 700px"
             [alt]="photo.altText || title()" [attr.width]="photo.width" [attr.height]="photo.height" />
      </figure>
      @if (photos().length > 1) {
        <div class="thumbs" role="list" aria-label="Photos">
          @for (p of photos(); track p.id; let i = $index) {
            <button type="button" role="listitem" [class.on]="i === index()" (click)="index.set(i)" [attr.aria-label]="'Show photo ' + (i + 1)">
              <img [src]="src(p, 320)" alt="" loading="lazy" width="96" height="64" />
            </button>
          }
        </div>
      }
    } @else {
      <div class="none">The grower has not added photos yet.</div>
    }
  `,
  styles: `
    .main { margin: 0; }
    .main img { width: 100%; height: auto; aspect-ratio: 3 / 2; object-fit: cover; border-radius: var(--mat-sys-corner-large); background: var(--mat-sys-surface-container); }
    .thumbs { display: flex; gap: 8px; margin-top: 8px; flex-wrap: wrap; }
    .thumbs button { padding: 0; border: 2px solid transparent; border-radius: 6px; background: none; cursor: pointer; }
    .thumbs button.on { border-color: var(--mat-sys-primary); }
    .thumbs img { display: block; width: 96px; height: 64px; object-fit: cover; border-radius: 4px; }
    .none { aspect-ratio: 3 / 2; display: grid; place-items: center; background: var(--mat-sys-surface-container); border-radius: var(--mat-sys-corner-large); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotGallery {
  readonly photos = input.required<PhotoView[]>();
  readonly title = input('');
  protected readonly index = signal(0);
  protected readonly current = computed(() => this.photos()[this.index()] ?? this.photos()[0] ?? null);

  protected src(photo: PhotoView, width: number): string {
    const webp = photo.variants.filter((v) => v.format === 'webp').sort((a, b) => a.width - b.width);
    return (webp.find((v) => v.width >= width) ?? webp[webp.length - 1])?.url ?? '';
  }

  protected srcset(photo: PhotoView): string {
    return photo.variants.filter((v) => v.format === 'webp').map((v) => `${v.url} ${v.width}w`).join(', ');
  }
}
