import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { addDays } from '@keenroute/shared';
import { Repository } from 'typeorm';
import type { AppConfig } from '../../config/environment';
import { JobsService } from '../../jobs/jobs.service';
import { todayIn } from '../../stops/business-today';
import { Stop } from '../../stops/entities/stop.entity';
import { PlanningSettings } from '../entities/planning-settings.entity';
import { RouteDayStop } from '../entities/route-day-stop.entity';
import { RouteDay } from '../entities/route-day.entity';
import { VisitNotice, type VisitNoticeStatus } from '../entities/visit-notice.entity';
import type { VisitNoticeJob } from './visit-notice-delivery';

export const VISIT_NOTICE_QUEUE = 'visit-notice';
export const NOTICES_DUE_QUEUE = 'visit-notices-due';

/** The migration's default lead time, used until the owner saves planning settings. */
const DEFAULT_NOTICE_DAYS = 3;

/** A job per stop and day is enough for an hour: queueing again within it adds nothing (the notices table decides). */
const SINGLETON_SECONDS = 3600;

export interface NoticeRun {
  today: string;
  /** Route days after today up to this one are announced (today itself when the lead time is 0). */
  through: string;
  /** Stops on those days. */
  stops: number;
  /** Jobs added now; the rest were already queued this hour. */
  queued: number;
}

export interface NoticeRow {
  id: string;
  stopId: string;
  stopName: string;
  day: string;
  recipient: string;
  customerId: string | null;
  status: VisitNoticeStatus;
  attempts: number;
  lastError: string | null;
  sentAt: Date | null;
}

@Injectable()
export class VisitNoticesService {
  private readonly logger = new Logger(VisitNoticesService.name);
  private readonly timeZone: string;

  constructor(
    private readonly jobs: JobsService,
    @InjectRepository(PlanningSettings) private readonly settings: Repository<PlanningSettings>,
    @InjectRepository(RouteDayStop) private readonly routeDayStops: Repository<RouteDayStop>,
    @InjectRepository(VisitNotice) private readonly notices: Repository<VisitNotice>,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  today(): string {
    return todayIn(this.timeZone);
  }

  /**
   * Queues a 'visit-notice' job for every stop on a route day after `today` and no more than the notice lead time
   * ahead. Days nearer than the lead time are included so a stop placed late, or a run missed while the server was
   * down, still gets its notice; a notice already sent is never sent again.
   */
  async queueDue(today: string): Promise<NoticeRun> {
    const noticeDays = (await this.settings.findOneBy({ id: 1 }))?.noticeDays ?? DEFAULT_NOTICE_DAYS;
    const through = addDays(today, noticeDays);
    // A lead time of 0 means notices on the day itself.
    const from = noticeDays === 0 ? today : addDays(today, 1);
    const due = await this.routeDayStops
      .createQueryBuilder('rds')
      .innerJoin(RouteDay, 'rd', 'rd.id = rds.route_day_id')
      .select('rds.stop_id', 'stopId')
      .addSelect("to_char(rd.day, 'YYYY-MM-DD')", 'day')
      .where('rd.day BETWEEN :from AND :through', { from, through })
      .groupBy('rds.stop_id')
      .addGroupBy('rd.day')
      .orderBy('day')
      .getRawMany<VisitNoticeJob>();
    let queued = 0;
    for (const job of due) {
      const id = await this.jobs.send(VISIT_NOTICE_QUEUE, job, {
        singletonKey: `${job.stopId}:${job.day}`,
        singletonSeconds: SINGLETON_SECONDS,
      });
      if (id) queued += 1;
    }
    this.logger.log({ today, through, stops: due.length, queued }, 'visit notices queued');
    return { today, through, stops: due.length, queued };
  }

  /** Every notice for route days on `day`, by stop then recipient. */
  async list(day: string): Promise<NoticeRow[]> {
    const rows = await this.notices
      .createQueryBuilder('notice')
      .innerJoin(Stop, 'stop', 'stop.id = notice.stop_id')
      .select([
        'notice.id AS "id"',
        'notice.stop_id AS "stopId"',
        'stop.name AS "stopName"',
        `to_char(notice.day, 'YYYY-MM-DD') AS "day"`,
        'notice.recipient AS "recipient"',
        'notice.customer_id AS "customerId"',
        'notice.status AS "status"',
        'notice.attempts AS "attempts"',
        'notice.last_error AS "lastError"',
        'notice.sent_at AS "sentAt"',
      ])
      .where('notice.day = :day', { day })
      .orderBy('stop.name')
      .addOrderBy('notice.recipient')
      .getRawMany<NoticeRow>();
    return rows;
  }
}
