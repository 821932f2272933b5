import { computed, Injectable } from '@angular/core';
import { storedList } from '../../core/stored-list';

/**
 * One lot in the cart. Prices are a snapshot taken when the line was added (integer cents);
 * checkout will price the order again from the live lot.
 */
export interface CartLine {
  lotId: number;
  title: string;
  farmName: string;
  tons: number;
  bales: number;
  hayCents: number;
  /** Freight estimate, whole cents; null when not quoted. */
  freightCents: number | null;
}

const STORAGE_KEY = 'baleproof.cart.v1';

/**
 * The buyer's cart. Lives in the browser (localStorage) so it survives reloads and works signed out;
 * the server always renders an empty cart, and `restore()` runs after the first render.
 */
@Injectable({ providedIn: 'root' })
export class CartStore {
  private readonly stored = storedList('local', STORAGE_KEY, isCartLine);
  private readonly state = this.stored.items;

  readonly lines = this.state;
  readonly count = computed(() => this.state().length);
  readonly tons = computed(() => this.state().reduce((sum, l) => sum + l.tons, 0));
  readonly hayCents = computed(() => this.state().reduce((sum, l) => sum + l.hayCents, 0));
  readonly freightCents = computed(() => this.state().reduce((sum, l) => sum + (l.freightCents ?? 0), 0));
  readonly totalCents = computed(() => this.hayCents() + this.freightCents());

  /** Adds lines; a lot already in the cart is replaced by the new quantity. */
  addLines(lines: readonly CartLine[]): void {
    this.restore();
    const incoming = new Map(lines.map((l) => [l.lotId, l]));
    this.save([...this.state().filter((l) => !incoming.has(l.lotId)), ...lines]);
  }

  /** Changes how many bales of a lot are on the list (whole bales, at least one). */
  setBales(lotId: number, bales: number): void {
    if (!Number.isInteger(bales) || bales < 1) return;
    this.save(this.state().map((l) => (l.lotId === lotId ? { ...l, bales } : l)));
  }

  remove(lotId: number): void {
    this.save(this.state().filter((l) => l.lotId !== lotId));
  }

  clear(): void {
    this.save([]);
  }

  restore(): void {
    this.stored.restore();
  }

  private save(lines: readonly CartLine[]): void {
    this.stored.save(lines);
  }
}

function isCartLine(x: unknown): x is CartLine {
  const l = x as Partial<CartLine> | null;
  return (
    !!l &&
    Number.isInteger(l.lotId) &&
    typeof l.title === 'string' &&
    typeof l.farmName === 'string' &&
    typeof l.tons === 'number' &&
    Number.isInteger(l.bales) &&
    Number.isInteger(l.hayCents) &&
    (l.freightCents === null || Number.isInteger(l.freightCents))
  );
}
