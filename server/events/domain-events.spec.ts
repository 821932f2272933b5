import type { ApiDeps } from '../api-deps';
import { DomainEvents } from './domain-events';

describe('DomainEvents', () => {
  const errors: unknown[] = [];
  const deps = { logger: { error: (...args: unknown[]) => void errors.push(args) } } as unknown as ApiDeps;

  it('runs listeners in order, one at a time, and stops calling a removed one', async () => {
    const events = new DomainEvents();
    const heard: string[] = [];
    events.on('lot.approved', async (_d, { lotId }) => {
      await new Promise((r) => setTimeout(r, 5));
      heard.push(`slow ${lotId}`);
    });
    const off = events.on('lot.approved', (_d, { lotId }) => void heard.push(`fast ${lotId}`));
    await events.emit(deps, 'lot.approved', { lotId: 7 });
    off();
    await events.emit(deps, 'lot.approved', { lotId: 8 });
    expect(heard).toEqual(['slow 7', 'fast 7', 'slow 8']);
  });

  it('logs a failing listener and still runs the next one', async () => {
    const events = new DomainEvents();
    const heard: number[] = [];
    events.on('lot.approved', () => {
      throw new Error('mail server down');
    });
    events.on('lot.approved', (_d, { lotId }) => void heard.push(lotId));
    await expect(events.emit(deps, 'lot.approved', { lotId: 3 })).resolves.toBeUndefined();
    expect(heard).toEqual([3]);
    expect(errors).toHaveLength(1);
  });
});
