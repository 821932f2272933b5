import { computed, Injectable } from '@angular/core';
import { MAX_COMPARED_LOTS } from '@shared/contracts/compare-limits';
import { storedList } from '../../../core/stored-list';
import { COMPARE_STORAGE_KEY } from './compare-storage';

/**
 * Lots the buyer has ticked for comparison (at most four), kept for the browser tab.
 * The server renders with an empty selection; `restore()` (called after the first render)
 * brings back what the tab had, so hydration sees the same DOM the server sent.
 */
@Injectable({ providedIn: 'root' })
export class CompareSelection {
  private readonly stored = storedList('session', COMPARE_STORAGE_KEY, (x): x is number => Number.isInteger(x) && (x as number) > 0, MAX_COMPARED_LOTS);
  private readonly selected = this.stored.items;

  readonly ids = this.selected;
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
    this.stored.restore();
  }

  private save(ids: readonly number[]): void {
    this.stored.save(ids);
  }
}
