import type { ApiDeps } from '../api-deps';

/** What happened in the marketplace that other features react to, and what each event carries. */
export interface DomainEventMap {
  /** An admin approved a lot and it is public (committed). */
  'lot.approved': { lotId: number };
}

export type DomainEventName = keyof DomainEventMap;
export type DomainListener<E extends DomainEventName> = (deps: ApiDeps, payload: DomainEventMap[E]) => Promise<void> | void;

/**
 * A typed in-process event emitter for things to do after a change has been committed. Listeners run
 * in the order they were added, one at a time; one that fails is logged and does not stop the others or
 * undo the change. A durable job queue can take a listener's place without its callers changing.
 */
export class DomainEvents {
  private readonly listeners: { [E in DomainEventName]?: Array<DomainListener<E>> } = {};

  /** Adds a listener; returns a function that removes it again. */
  on<E extends DomainEventName>(event: E, listener: DomainListener<E>): () => void {
    const list = (this.listeners[event] ??= []) as Array<DomainListener<E>>;
    list.push(listener);
    return () => {
      const at = list.indexOf(listener);
      if (at >= 0) list.splice(at, 1);
    };
  }

  async emit<E extends DomainEventName>(deps: ApiDeps, event: E, payload: DomainEventMap[E]): Promise<void> {
    for (const listener of [...((this.listeners[event] ?? []) as Array<DomainListener<E>>)]) {
      try {
        await listener(deps, payload);
      } catch (err) {
        deps.logger.error({ err, event, payload }, 'an event listener failed');
      }
    }
  }
}
