import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import PgBoss from 'pg-boss';
import { DataSource, type EntityManager } from 'typeorm';
import type { AppConfig } from '../config/environment';
import { withJobsSetupLock } from './setup-lock';

/** How a queue retries and keeps its jobs; every job sent to it inherits these unless the send says otherwise. */
export interface QueueSettings {
  retryLimit?: number;
  /** Seconds; with retryBackoff, the first of a doubling delay. */
  retryDelay?: number;
  retryBackoff?: boolean;
  expireInSeconds?: number;
  retentionMinutes?: number;
}

export interface SendOptions extends QueueSettings {
  /** With singletonSeconds: at most one job per key in each such time slot. */
  singletonKey?: string;
  singletonSeconds?: number;
  startAfter?: Date | number;
  /** A fixed job id: pg-boss keeps one job per id, so sending the same id twice queues it once. */
  id?: string;
  /** Queue the job inside this transaction: it exists exactly when the caller's rows do. */
  manager?: EntityManager;
}

export interface WorkOptions {
  /** Jobs taken per fetch (worked one after another); pg-boss fetches once per polling interval. */
  batchSize?: number;
  pollingIntervalSeconds?: number;
}

export interface QueuedJob<T> {
  id: string;
  name: string;
  data: T;
}

/** A job's work; throwing fails the job, and pg-boss tries it again while the queue's retry limit allows. */
export type JobHandler<T> = (job: QueuedJob<T>) => Promise<void>;

/** pg-boss on the app's database, in its own 'pgboss' schema: queues, workers and cron schedules. */
@Injectable()
export class JobsService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(JobsService.name);
  private readonly boss: PgBoss;
  private readonly workers: boolean;
  private started: Promise<void> | undefined;

  constructor(
    config: ConfigService<AppConfig, true>,
    private readonly dataSource: DataSource,
  ) {
    this.workers = config.get('JOBS_WORKERS', { infer: true }) === 'on';
    this.boss = new PgBoss({
      connectionString: config.get('DATABASE_URL', { infer: true }),
      schema: 'pgboss',
      application_name: 'keenroute-jobs',
      // Few statements run at once; a small pool keeps many test apps under PostgreSQL's connection limit.
      max: 4,
      // Only an instance that works jobs turns cron schedules into jobs.
      schedule: this.workers,
      // Maintenance is what fails (and so retries) a job whose worker died holding it, once the job's expiry passed.
      maintenanceIntervalSeconds: config.get('JOBS_MAINTENANCE_SECONDS', { infer: true }),
    });
    this.boss.on('error', (error) => this.logger.error({ err: error }, 'background jobs error'));
  }

  /** Whether this instance works jobs (JOBS_WORKERS); queueing works either way. */
  get working(): boolean {
    return this.workers;
  }

  onApplicationBootstrap(): Promise<void> {
    return this.start();
  }

  /** Stops before the database connections close, so a job in progress can finish its own writes. */
  async onModuleDestroy(): Promise<void> {
    if (!this.started) return;
    await this.started.catch(() => undefined);
    await this.boss.stop({ graceful: true, wait: true, timeout: 10_000 });
  }

  /** Starts once; every other method waits for it, so feature modules may call them in any bootstrap order. */
  start(): Promise<void> {
    this.started ??= withJobsSetupLock(this.dataSource, async () => {
      await this.boss.start();
    });
    return this.started;
  }

  async createQueue(name: string, settings: QueueSettings = {}): Promise<void> {
    await this.start();
    if (await this.boss.getQueue(name)) return;
    await withJobsSetupLock(this.dataSource, () => this.boss.createQueue(name, { name, ...settings }));
  }

  /** The job's id, or null when a job with the same singleton key already holds the slot. */
  async send<T extends object>(name: string, data: T, options: SendOptions = {}): Promise<string | null> {
    await this.start();
    const { manager, ...rest } = options;
    if (!manager) return this.boss.send(name, data, rest);
    const runner = manager.queryRunner;
    if (!runner) throw new Error(`A job for ${name} was to be queued in a transaction, but the manager has none.`);
    const db = {
      executeSql: async (text: string, values: unknown[]) => ({
        rows: (await runner.query(text, values, true)).records as unknown[],
      }),
    };
    return this.boss.send(name, data, { ...rest, db });
  }

  /**
   * Works jobs one at a time. pg-boss waits its polling interval after every fetch, so a queue that must keep up (mail)
   * takes a batch per fetch; each job of it succeeds or fails on its own: a failed one is failed (and so retried) here,
   * and pg-boss completes the rest, which are still active, when the batch is done.
   */
  async work<T>(name: string, handler: JobHandler<T>, options: WorkOptions = {}): Promise<void> {
    await this.start();
    if (!this.workers) return;
    const { batchSize = 1, pollingIntervalSeconds = 2 } = options;
    await this.boss.work<T>(name, { batchSize, pollingIntervalSeconds }, async (jobs) => {
      if (jobs.length === 1) {
        const [job] = jobs;
        return handler({ id: job!.id, name: job!.name, data: job!.data });
      }
      for (const job of jobs) {
        try {
          await handler({ id: job.id, name: job.name, data: job.data });
        } catch (error) {
          this.logger.warn({ err: error, queue: name, jobId: job.id }, 'job failed; pg-boss retries it');
          await this.boss.fail(name, job.id, { message: error instanceof Error ? error.message : String(error) });
        }
      }
    });
  }

  /** A cron schedule (one per queue name; calling again replaces it): every instance may call this at start. */
  async schedule(name: string, cron: string, timeZone: string, data: object = {}): Promise<void> {
    await this.start();
    await this.boss.schedule(name, cron, data, { tz: timeZone });
  }
}
