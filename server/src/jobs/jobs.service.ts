import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import PgBoss from 'pg-boss';
import { DataSource } from 'typeorm';
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
    return this.boss.send(name, data, options);
  }

  /** Works jobs one at a time (pg-boss hands over a batch; one job's failure must not fail its neighbours). */
  async work<T>(name: string, handler: JobHandler<T>): Promise<void> {
    await this.start();
    if (!this.workers) return;
    await this.boss.work<T>(name, { batchSize: 1 }, async (jobs) => {
      for (const job of jobs) await handler({ id: job.id, name: job.name, data: job.data });
    });
  }

  /** A cron schedule (one per queue name; calling again replaces it): every instance may call this at start. */
  async schedule(name: string, cron: string, timeZone: string, data: object = {}): Promise<void> {
    await this.start();
    await this.boss.schedule(name, cron, data, { tz: timeZone });
  }
}
