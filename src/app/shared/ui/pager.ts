import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';

export interface PagerChange {
  page: number;
  pageSize: number;
}

/** Moves through a long list in our own words: "Lots 13–24 of 26", earlier and later pages, how many a page. */
@Component({
  selector: 'app-pager',
  imports: [DecimalPipe],
  template: `
    <nav class="pager" [attr.aria-label]="label()">
      <p class="where bp-num" aria-live="polite">
        @if (total() === 0) { No {{ noun() }} } @else {
          {{ nounTitle() }} {{ first() | number }}–{{ last() | number }} of {{ total() | number }}
        }
      </p>
      <div class="moves">
        <button type="button" class="move" [disabled]="page() <= 1" (click)="go(page() - 1)">‹ Earlier {{ noun() }}</button>
        <span class="bp-num page-of">Page {{ page() }} of {{ pages() }}</span>
        <button type="button" class="move" [disabled]="page() >= pages()" (click)="go(page() + 1)">Later {{ noun() }} ›</button>
      </div>
      <div class="size" role="group" [attr.aria-label]="nounTitle() + ' shown at a time'">
        <span aria-hidden="true">Show</span>
        @for (s of sizes(); track s) {
          <button type="button" [attr.aria-pressed]="s === pageSize()" [class.on]="s === pageSize()" (click)="resize(s)">{{ s }}</button>
        }
        <span aria-hidden="true">at a time</span>
      </div>
    </nav>
  `,
  styles: `
    .pager { display: flex; flex-wrap: wrap; align-items: center; gap: 8px 20px; padding: 10px 0; border-top: 1.5px solid var(--bp-ink); margin-top: 8px; }
    .where { margin: 0; font-weight: 600; }
    .moves { display: flex; align-items: center; gap: 8px; }
    .page-of { color: var(--bp-muted); font-size: var(--bp-text-sm); }
    button { font: inherit; font-weight: 600; color: var(--bp-ink); background: var(--bp-tag); border: 1.5px solid var(--bp-ink); border-radius: 3px; padding: 5px 10px; cursor: pointer; }
    button:disabled { opacity: 0.45; cursor: default; border-color: var(--bp-rule); }
    .size { display: flex; align-items: center; gap: 4px; margin-left: auto; font-size: var(--bp-text-sm); color: var(--bp-muted); }
    .size button { padding: 2px 8px; border-color: var(--bp-rule); }
    .size button.on { background: var(--bp-ink); color: var(--bp-tag); border-color: var(--bp-ink); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Pager {
  readonly total = input.required<number>();
  /** 1-based. */
  readonly page = input.required<number>();
  readonly pageSize = input.required<number>();
  readonly sizes = input<number[]>([12, 24, 48]);
  readonly noun = input('lots');
  readonly label = input('Pages of results');
  readonly changed = output<PagerChange>();

  protected readonly pages = computed(() => Math.max(1, Math.ceil(this.total() / this.pageSize())));
  protected readonly first = computed(() => Math.min(this.total(), (this.page() - 1) * this.pageSize() + 1));
  protected readonly last = computed(() => Math.min(this.total(), this.page() * this.pageSize()));
  protected readonly nounTitle = computed(() => this.noun().charAt(0).toUpperCase() + this.noun().slice(1));

  protected go(page: number): void {
    this.changed.emit({ page, pageSize: this.pageSize() });
  }

  protected resize(pageSize: number): void {
    // Keep the first lot on screen in view when the page size changes.
    const firstIndex = (this.page() - 1) * this.pageSize();
    this.changed.emit({ page: Math.floor(firstIndex / pageSize) + 1, pageSize });
  }
}
