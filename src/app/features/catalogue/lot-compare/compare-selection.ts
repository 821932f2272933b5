import { DOCUMENT, isPlatformBrowser } from '@angular/common';
import { computed, inject, Injectable, PLATFORM_ID, signal } from '@angular/core';
import { MAX_COMPARED_LOTS } from '../../../../../shared/contracts/compare';

const STORAGE_KEY = 'baleproof.compare';

/**
 * Lots the buyer has ticked for comparison (at most four), kept for the browser tab.
 * The server renders with an empty selection; `restore()` (called after the first render)
 * brings back what the tab had, so hydration sees the same DOM the server sent.
 */
@Injectable({ providedIn: 'root' })
export class CompareSelection {
  private readonly browser = isPlatformBrowser(inject(PLATFORM_ID));
  private readonly document = inject(DOCUMENT);
  private readonly storage = this.browser ? (this.document.defaultView?.sessionStorage ?? null) : null;
  private readonly selected = signal<readonly number[]>([]);
  private restored = false;

  readonly ids = this.selected.asReadonly();
  readonly count = computed(() => this.selected().length);
  readonly full = computed(() => this.selected().length >= MAX_COMPARED_LOTS);
  readonly max = MAX_COMPARED_LOTS;

  has(id: number): boolean {
    return this.selected().includes(id);
  }

  toggle(id: number): void {
    const now = this.selected();
    if (now.includes(id)) this.save(now.filter((x) => x !== id));
    else if (now.length < MAX_COMPARED_LOTS) this.save([...now, id]);
  }

  remove(id: number): void {
    this.save(this.selected().filter((x) => x !== id));
  }

  clear(): void {
    this.save([]);
  }

  restore(): void {
    if (!this.browser || this.restored) return;
    this.restored = true;
    try {
      const raw = JSON.parse(this.storage?.getItem(STORAGE_KEY) ?? '[]') as unknown;
      if (Array.isArray(raw)) this.selected.set(raw.filter((x): x is number => Number.isInteger(x) && x > 0).slice(0, MAX_COMPARED_LOTS));
    } catch {
      // A damaged entry is simply forgotten.
    }
  }

  private save(ids: readonly number[]): void {
    this.selected.set(ids);
    if (this.browser) this.storage?.setItem(STORAGE_KEY, JSON.stringify(ids));
  }
}
