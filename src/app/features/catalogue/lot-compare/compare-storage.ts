/** Where the tab keeps the lots ticked for comparison (sessionStorage; see compare-selection.ts). */
export const COMPARE_STORAGE_KEY = 'baleproof.compare';

/**
 * Whether the tab has lots ticked for comparison: the catalogue then shows its compare bar, which only the
 * running app can draw, so the app starts at once. Plain DOM, so it can be asked before the app starts.
 */
export function tabHasComparedLots(storage: () => Pick<Storage, 'getItem'> | null | undefined): boolean {
  try {
    // Reaching the storage may itself throw (storage blocked by the browser's settings): then there are no lots.
    const raw = JSON.parse(storage()?.getItem(COMPARE_STORAGE_KEY) ?? '[]') as unknown;
    return Array.isArray(raw) && raw.length > 0;
  } catch {
    return false;
  }
}
