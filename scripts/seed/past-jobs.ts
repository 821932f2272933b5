import type { Jobs } from '../../server/adapters/queue/jobs';

/**
 * The job queue as the demo's history sees it: the approvals and notices of an invented past are not news,
 * so the e-mails and jobs they would start are counted and dropped, never sent to the demo's addresses.
 */
export function pastJobs(): Jobs & { dropped(): number } {
  let dropped = 0;
  const drop = async () => {
    dropped += 1;
    return '';
  };
  return {
    enqueue: drop,
    enqueueMail: drop,
    register: () => undefined,
    schedule: async () => undefined,
    schedules: async () => [],
    start: async () => undefined,
    stop: async () => undefined,
    drain: async () => ({ completed: 0, failed: 0 }),
    dropped: () => dropped,
  };
}
