import PgBoss from 'pg-boss';
import { poolTimeouts } from '../db.ts';
import { logger } from '../logger.ts';

/** How a job is queued (pg-boss send options: a singleton key, a delay, ...). */
export type SendOptions = PgBoss.SendOptions;

/** A background job's handler; throwing makes pg-boss retry it with backoff. */
export type JobHandler<T extends object> = (data: T) => Promise<void>;

/** Several jobs of one kind at once: a queue that fills faster than it drains merges its work. */
export type BatchHandler<T extends object> = (items: T[]) => Promise<void>;

const handlers = new Map<string, { run: BatchHandler<object>; batchSize: number }>();
let boss: PgBoss | undefined;

/**
 * Registers the worker of a job kind, one job at a time. Called from the server's wiring
 * (`server/wiring.ts`), never at module load; registering a name again replaces its worker, so
 * building several apps in one process (tests) is harmless.
 * @param name the job kind
 * @param handler handles one job's data
 */
export function registerJob<T extends object>(name: string, handler: JobHandler<T>): void {
  registerBatchJob<T>(
    name,
    async (items) => {
      for (const item of items) await handler(item);
    },
    { batchSize: 1 },
  );
}

/**
 * Registers the worker of a job kind that takes up to `batchSize` waiting jobs at a time and handles
 * them together (the queue is polled every half second, so one job per poll would drain a burst of a
 * thousand catalogue edits in eight minutes). Throwing fails, and retries, the whole batch.
 * @param name the job kind
 * @param handler handles the jobs' data, oldest first
 * @param options.batchSize most jobs handled at once
 */
export function registerBatchJob<T extends object>(
  name: string,
  handler: BatchHandler<T>,
  { batchSize }: { batchSize: number },
): void {
  handlers.set(name, { run: handler as BatchHandler<object>, batchSize });
}

/**
 * Starts pg-boss on the app's database (its tables live in their own `pgboss` schema). With
 * `workers` (roles `worker` and `both`) it also runs every registered job and pg-boss's own
 * maintenance and schedules; without (role `web`) it only queues jobs for a worker to run.
 * @param options.workers run jobs here (default true)
 */
export async function startJobQueue(databaseUrl: string, { pollingIntervalSeconds = 0.5, workers = true } = {}): Promise<PgBoss> {
  if (boss) return boss;
  // The same timeouts as the app's other pools: enqueuing from a request never hangs on a frozen database.
  const instance = new PgBoss({
    connectionString: databaseUrl,
    max: 4,
    ...(workers ? {} : { supervise: false, schedule: false }),
    ...(poolTimeouts() as object),
  });
  instance.on('error', (err) => logger.warn({ err }, 'job queue error'));
  await instance.start();
  for (const [name, { run, batchSize }] of handlers) {
    await instance.createQueue(name, { name, retryLimit: 5, retryDelay: 2, retryBackoff: true });
    if (!workers) continue;
    await instance.work<object>(name, { pollingIntervalSeconds, batchSize }, async (jobs) => {
      await run(jobs.map((job) => job.data));
    });
  }
  boss = instance;
  return instance;
}

/** Puts a job on the queue. Without a running queue (a CLI, some tests) the job runs inline. */
export async function enqueue(name: string, data: object, options: SendOptions = {}): Promise<void> {
  if (boss) {
    await boss.send(name, data, options);
    return;
  }
  const handler = handlers.get(name);
  if (!handler) throw new Error(`Unknown job ${name}: the server's wiring (server/wiring.ts) registers every job`);
  await handler.run([data]);
}

/** Stops the workers, letting running jobs finish. */
export async function stopJobQueue(): Promise<void> {
  if (!boss) return;
  await boss.stop({ graceful: true, wait: true, timeout: 10_000 });
  boss = undefined;
}
