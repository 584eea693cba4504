import { Module, type OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import type { AppConfig } from '../../config/environment';
import { Customer } from '../../customers/entities/customer.entity';
import { JobsService } from '../../jobs/jobs.service';
import { Stop } from '../../stops/entities/stop.entity';
import { PlanningSettings } from '../entities/planning-settings.entity';
import { RouteDayStop } from '../entities/route-day-stop.entity';
import { RouteDay } from '../entities/route-day.entity';
import { VisitNotice } from '../entities/visit-notice.entity';
import { VisitNoticeDelivery, type VisitNoticeJob } from './visit-notice-delivery';
import { VisitNoticesController } from './visit-notices.controller';
import { NOTICES_DUE_QUEUE, VISIT_NOTICE_QUEUE, VisitNoticesService } from './visit-notices.service';

@Module({
  imports: [TypeOrmModule.forFeature([PlanningSettings, RouteDay, RouteDayStop, VisitNotice, Stop, Customer])],
  controllers: [VisitNoticesController],
  providers: [VisitNoticesService, VisitNoticeDelivery],
  exports: [VisitNoticesService],
})
export class VisitNoticesModule implements OnApplicationBootstrap {
  constructor(
    private readonly jobs: JobsService,
    private readonly notices: VisitNoticesService,
    private readonly delivery: VisitNoticeDelivery,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  /** Queues, workers and the schedule; each instance registers them, pg-boss keeps one of each. */
  async onApplicationBootstrap(): Promise<void> {
    // An SMTP outage is retried for 15 to 30 minutes: after 30-60 s, then doubling with jitter, five times.
    await this.jobs.createQueue(VISIT_NOTICE_QUEUE, { retryLimit: 5, retryDelay: 30, retryBackoff: true });
    await this.jobs.createQueue(NOTICES_DUE_QUEUE, { retryLimit: 2, retryDelay: 60 });
    await this.jobs.work<VisitNoticeJob>(VISIT_NOTICE_QUEUE, async (job) => {
      await this.delivery.deliver(job.data);
    });
    await this.jobs.work(NOTICES_DUE_QUEUE, async () => {
      await this.notices.queueDue(this.notices.today());
    });
    const cron = this.config.get('VISIT_NOTICE_CRON', { infer: true });
    await this.jobs
      .schedule(NOTICES_DUE_QUEUE, cron, this.config.get('BUSINESS_TIME_ZONE', { infer: true }))
      .catch((error: unknown) => {
        // pg-boss checks the expression; the message should name the variable to fix.
        throw new Error(`VISIT_NOTICE_CRON: "${cron}" is not a cron expression pg-boss accepts (${String(error)})`);
      });
  }
}
