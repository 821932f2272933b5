import { DOCUMENT, isPlatformBrowser } from '@angular/common';
import { inject, PLATFORM_ID, signal, type Signal } from '@angular/core';

/** A list kept in a signal and mirrored to the browser's storage. */
export interface StoredList<T> {
  readonly items: Signal<readonly T[]>;
  /** Brings back what the browser stored (once; call after the first render so hydration matches the server). */
  restore(): void;
  save(items: readonly T[]): void;
}

/**
 * A list persisted in localStorage or sessionStorage under `key`. On the server it stays empty and nothing is
 * stored; entries that fail `accept` (or a damaged entry) are dropped rather than shown wrong.
 * Call from an injection context.
 */
export function storedList<T>(where: 'local' | 'session', key: string, accept: (x: unknown) => x is T, limit = Infinity): StoredList<T> {
  const browser = isPlatformBrowser(inject(PLATFORM_ID));
  const view = inject(DOCUMENT).defaultView;
  const storage = browser ? ((where === 'local' ? view?.localStorage : view?.sessionStorage) ?? null) : null;
  const items = signal<readonly T[]>([]);
  let restored = false;
  return {
    items: items.asReadonly(),
    restore() {
      if (!browser || restored) return;
      restored = true;
      try {
        const raw = JSON.parse(storage?.getItem(key) ?? '[]') as unknown;
        if (Array.isArray(raw)) items.set(raw.filter(accept).slice(0, limit));
      } catch {
        // A damaged entry is forgotten.
      }
    },
    save(next) {
      items.set(next);
      storage?.setItem(key, JSON.stringify(next));
    },
  };
}
