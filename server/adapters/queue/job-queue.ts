import PgBoss from 'pg-boss';
import type { Pool } from 'pg';
import type { Logger } from '../../logger';

/**
 * A kind of background job: its queue name and how it is retried. Delays double after each failed
 * attempt (pg-boss backoff: about `retryDelaySeconds × 2^attempt`, with jitter).
 */
export interface JobKind<T extends object> {
  readonly name: string;
  readonly retryLimit: number;
  readonly retryDelaySeconds: number;
  /** Jobs are plain JSON in PostgreSQL; the handler only ever sees data that passed this check. */
  readonly parse: (data: unknown) => T;
  /**
   * pg-boss queue policy. 'stately': at most one job waiting and one running (a periodic sweep: a tick
   * while one waits is dropped). Default 'standard'. Applies when the queue is first created.
   */
  readonly policy?: 'standard' | 'stately';
}

export type JobHandler<T extends object> = (data: T, attempt: { id: string; retryCount: number; retryLimit: number }) => Promise<void>;

export interface DrainOutcome {
  completed: number;
  failed: number;
}

/**
 * A durable job queue in the app's own PostgreSQL database (pg-boss, schema `pgboss` by default).
 * Enqueueing commits a row and returns; workers run handlers outside any request, retry failures
 * with backoff and log every failure. Nothing is lost if the process stops: jobs wait in the table.
 */
export interface JobQueue {
  /**
   * Adds a job; resolves with its id once it is stored. A 'stately' queue that already has one waiting stores
   * nothing: that throws, unless `unlessWaiting` is set (the waiting job does the same work), which resolves ''.
   */
  enqueue<T extends object>(kind: JobKind<T>, data: T, options?: { startAfter?: Date; singletonKey?: string; unlessWaiting?: boolean }): Promise<string>;
  /** Says what to do with jobs of a kind. Register before or after `start()`. */
  register<T extends object>(kind: JobKind<T>, handler: JobHandler<T>): void;
  /**
   * Sends a job of this kind on a cron schedule (UTC, at most once a minute). The schedule is stored in
   * the database, and pg-boss sends each tick once however many processes run: the server's workers
   * take it in turn. Saving the same schedule again only updates it.
   */
  schedule<T extends object>(kind: JobKind<T>, cron: string, data: T): Promise<void>;
  /** The stored schedules: which queue, on which cron. */
  schedules(): Promise<{ name: string; cron: string }[]>;
  start(): Promise<void>;
  stop(): Promise<void>;
  /**
   * Runs every job that is due, in this process, until none is left (tests; workers are off there).
   * `includeDelayed` first runs, once, the jobs waiting for a later start (a retry delay, a scheduled
   * `startAfter`), as if that time had come.
   */
  drain(options?: { includeDelayed?: boolean }): Promise<DrainOutcome>;
}

export interface JobQueueOptions {
  /** The app's pg pool; pg-boss runs its SQL through it (no second pool). */
  pool: Pool;
  logger: Logger;
  /** PostgreSQL schema for the queue tables (created by pg-boss on start). */
  schema?: string;
  /** Poll for jobs in the background (the server); off in tests, which call `drain()`. */
  workers?: boolean;
  pollingIntervalSeconds?: number;
}

interface Registration {
  kind: JobKind<object>;
  handler: JobHandler<object>;
}

export function createJobQueue(options: JobQueueOptions): JobQueue {
  const { pool, logger, workers = true, pollingIntervalSeconds = 2 } = options;
  const boss = new PgBoss({
    db: { executeSql: (text, values) => pool.query(text, values) },
    schema: options.schema ?? 'pgboss',
    // Maintenance (expiry, archiving) and the cron clock only where real workers run; tests stay quiet and fast.
    supervise: workers,
    schedule: workers,
  });
  boss.on('error', (err) => logger.error({ err }, 'job queue error'));

  const registrations = new Map<string, Registration>();
  const queuesReady = new Map<string, Promise<void>>();
  let started: Promise<void> | null = null;
  let workersStarted = false;

  /** pg-boss itself started (its schema installed); a failed start is tried again on next use. */
  const bossStarted = (): Promise<void> => {
    started ??= boss.start().then(
      () => undefined,
      (err) => {
        started = null;
        throw err;
      },
    );
    return started;
  };

  const ensureQueue = (kind: JobKind<object>): Promise<void> => {
    let ready = queuesReady.get(kind.name);
    if (!ready) {
      ready = (async () => {
        await bossStarted();
        // Several processes starting at once create the same queues at once; pg-boss's DDL can then
        // deadlock in PostgreSQL (seen with two workers). The loser tries again after a short pause.
        for (let attempt = 1; ; attempt++) {
          if (await boss.getQueue(kind.name)) return;
          try {
            await boss.createQueue(kind.name, { name: kind.name, policy: kind.policy ?? 'standard', retryLimit: kind.retryLimit, retryDelay: kind.retryDelaySeconds, retryBackoff: true });
            return;
          } catch (err) {
            // Another process created it first.
            if (await boss.getQueue(kind.name)) return;
            const code = (err as { code?: string }).code;
            if (attempt >= 5 || !(code === '40P01' || code === '40001' || code === '23505')) throw err;
            await new Promise((resolve) => setTimeout(resolve, 50 + Math.random() * 200 * attempt));
          }
        }
      })();
      queuesReady.set(kind.name, ready);
      ready.catch(() => queuesReady.delete(kind.name));
    }
    return ready;
  };

  /** Runs one job's handler; a failure is logged (with whether it will be retried) and rethrown. */
  const run = async (registration: Registration, job: PgBoss.JobWithMetadata<object>): Promise<void> => {
    const attempt = { id: job.id, retryCount: job.retryCount, retryLimit: job.retryLimit };
    try {
      await registration.handler(registration.kind.parse(job.data), attempt);
    } catch (err) {
      const willRetry = job.retryCount < job.retryLimit;
      logger[willRetry ? 'warn' : 'error'](
        { err, queue: job.name, jobId: job.id, attempt: job.retryCount + 1, retryLimit: job.retryLimit },
        willRetry ? 'job failed; it will be retried' : 'job failed for the last time; kept in the queue archive',
      );
      throw err;
    }
  };

  const startWorker = async (registration: Registration) => {
    await ensureQueue(registration.kind);
    if (!workers) return;
    await boss.work<object>(registration.kind.name, { batchSize: 1, pollingIntervalSeconds, includeMetadata: true }, async ([job]) => {
      if (job) await run(registration, job);
    });
  };

  const runFetched = async (registration: Registration, fetched: PgBoss.JobWithMetadata<object>[], outcome: DrainOutcome) => {
    for (const job of fetched) {
      try {
        await run(registration, job);
        await boss.complete(job.name, job.id);
        outcome.completed += 1;
      } catch (err) {
        await boss.fail(job.name, job.id, { message: err instanceof Error ? err.message : String(err) });
        outcome.failed += 1;
      }
    }
  };

  return {
    async enqueue(kind, data, opts = {}) {
      await ensureQueue(kind as JobKind<object>);
      const id = await boss.send(kind.name, kind.parse(data), { startAfter: opts.startAfter, singletonKey: opts.singletonKey });
      if (!id && opts.unlessWaiting) return '';
      if (!id) throw new Error(`job not stored in queue ${kind.name}`);
      return id;
    },
    async schedule(kind, cron, data) {
      await ensureQueue(kind as JobKind<object>);
      await boss.schedule(kind.name, cron, kind.parse(data), { tz: 'UTC' });
    },
    async schedules() {
      await bossStarted();
      return (await boss.getSchedules()).map((s) => ({ name: s.name, cron: s.cron }));
    },
    register(kind, handler) {
      if (registrations.has(kind.name)) throw new Error(`a handler for ${kind.name} is already registered`);
      const registration = { kind, handler } as unknown as Registration;
      registrations.set(kind.name, registration);
      if (workersStarted) void startWorker(registration).catch((err) => logger.error({ err, queue: kind.name }, 'job worker did not start'));
    },
    async start() {
      await bossStarted();
      workersStarted = true;
      await Promise.all([...registrations.values()].map(startWorker));
    },
    async stop() {
      if (!started) return;
      await started.catch(() => undefined);
      // The pool belongs to the app, which closes it after this.
      await boss.stop({ graceful: true, close: false, timeout: 5000, wait: true });
      started = null;
      workersStarted = false;
      queuesReady.clear();
    },
    async drain({ includeDelayed = false } = {}) {
      const outcome: DrainOutcome = { completed: 0, failed: 0 };
      for (const registration of registrations.values()) await ensureQueue(registration.kind);
      if (includeDelayed) {
        for (const registration of registrations.values()) {
          const fetched = await boss.fetch<object>(registration.kind.name, { batchSize: 1000, includeMetadata: true, ignoreStartAfter: true });
          await runFetched(registration, fetched, outcome);
        }
      }
      // Handlers may enqueue more jobs (an approval enqueues alerts): go round until nothing is due.
      for (let round = 0; round < 50; round++) {
        let ran = 0;
        for (const registration of registrations.values()) {
          const fetched = await boss.fetch<object>(registration.kind.name, { batchSize: 100, includeMetadata: true });
          ran += fetched.length;
          await runFetched(registration, fetched, outcome);
        }
        if (ran === 0) return outcome;
      }
      throw new Error('jobs kept enqueueing jobs for 50 rounds');
    },
  };
}
