/**
 * A small, data-only state machine: a list of transitions, each naming the states it leaves from, the
 * state it leads to and who may take it. Order and delivery life-cycles are written in this shape so
 * services, pages and tests all read one table.
 */

/** Who acts on a purchase: the buyer, the grower selling the lot, an admin, or the system (webhooks, timers). */
export type Actor = 'buyer' | 'grower' | 'admin' | 'system';

export interface Transition<S extends string> {
  readonly from: readonly S[];
  readonly to: S;
  readonly by: readonly Actor[];
}

export interface Lifecycle<S extends string, E extends string> {
  readonly states: readonly S[];
  readonly transitions: Readonly<Record<E, Transition<S>>>;
}

export type TransitionCheck<S extends string> =
  | { readonly ok: true; readonly to: S }
  | { readonly ok: false; readonly reason: 'wrong_state' | 'not_allowed'; readonly message: string };

/** Whether `actor` may apply `event` to something in state `from`, and where it leads. */
export function checkTransition<S extends string, E extends string>(
  machine: Lifecycle<S, E>,
  from: S,
  event: E,
  actor: Actor,
  describe: (state: S) => string = (s) => s,
): TransitionCheck<S> {
  const t = machine.transitions[event];
  if (!t.from.includes(from)) {
    return { ok: false, reason: 'wrong_state', message: `This cannot be done while it is ${describe(from)}.` };
  }
  if (!t.by.includes(actor)) return { ok: false, reason: 'not_allowed', message: 'You are not the one who can do that.' };
  return { ok: true, to: t.to };
}

/** The events `actor` may apply in state `from` (for showing only the buttons that work). */
export function eventsFor<S extends string, E extends string>(machine: Lifecycle<S, E>, from: S, actor: Actor): E[] {
  return (Object.keys(machine.transitions) as E[]).filter((e) => {
    const t = machine.transitions[e];
    return t.from.includes(from) && t.by.includes(actor);
  });
}

/**
 * A refused step, thrown by a life-cycle's `require…` helper: the API answers 409 when the thing is in the
 * wrong state and 403 when the actor may not take the step (see server/middleware/error-handler.ts).
 */
export class TransitionRefused extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly reason: 'wrong_state' | 'not_allowed',
  ) {
    super(message);
    this.name = 'TransitionRefused';
  }
}
