/**
 * The journeys run on E2E_STACKS copies of the app side by side (`npm test`: 2), one per Playwright worker.
 * Copy i has a server, database, upload folder, mail catcher and Stripe fake of its own, on the base ports
 * + 5·i, so a journey that buys, lists or pays in one worker never changes what another worker sees.
 * Plain Node: read by the Playwright config, the journeys' support code and scripts/test.sh's conventions.
 */
export const STACK_PORT_STEP = 5;

/** How many copies of the app the journeys run on. */
export function stackCount(): number {
  return Math.max(1, Number(process.env['E2E_STACKS'] ?? 1) || 1);
}

/** The copy this Playwright worker uses (0 outside a worker, e.g. in Jest or the config). */
export function stackIndex(): number {
  return Number(process.env['TEST_PARALLEL_INDEX'] ?? 0) % stackCount();
}

/** A base port moved to copy `index`. */
export function stackPort(base: number | string, index = stackIndex()): number {
  return Number(base) + STACK_PORT_STEP * index;
}

/** An http://host:port address moved to copy `index` (its port shifted, the rest unchanged). */
export function stackUrl(url: string, index = stackIndex()): string {
  const moved = new URL(url);
  moved.port = String(stackPort(moved.port, index));
  return moved.toString().replace(/\/$/, '');
}
