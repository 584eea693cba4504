import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { DataSource, type EntityManager } from 'typeorm';
import type { AppConfig } from '../../config/environment';
import { Customer } from '../../customers/entities/customer.entity';
import { MailService } from '../../mail/mail.service';
import { RouteDayStop } from '../entities/route-day-stop.entity';
import { RouteDay } from '../entities/route-day.entity';
import { VisitNotice } from '../entities/visit-notice.entity';
import { Stop } from '../../stops/entities/stop.entity';
import { bookingUrl, visitNoticeMail } from './visit-notice-mail';

/** What one 'visit-notice' job carries: a stop on a route day. */
export interface VisitNoticeJob {
  stopId: string;
  day: string;
}

export interface Recipient {
  email: string;
  customerId: string | null;
  greetingName: string;
}

export interface DeliveryResult {
  sent: number;
  skipped: number;
  failed: number;
}

interface PlannedVisit {
  stopId: string;
  stopName: string;
  stopEmail: string | null;
  arrival: number;
}

/** Thrown after the failed rows are recorded, so pg-boss tries the job again later. */
export class VisitNoticeFailed extends Error {
  constructor(job: VisitNoticeJob, failed: number) {
    super(`${failed} visit notice(s) for stop ${job.stopId} on ${job.day} could not be sent; pg-boss retries.`);
    this.name = 'VisitNoticeFailed';
  }
}

const normalized = (email: string) => email.trim().toLowerCase();

/** The stop's own address first, then each consenting customer's; one e-mail per address. */
export function noticeRecipients(
  stop: { name: string; email: string | null },
  customers: Pick<Customer, 'id' | 'name' | 'email'>[],
): Recipient[] {
  const byEmail = new Map<string, Recipient>();
  const add = (email: string | null, customerId: string | null, greetingName: string) => {
    const key = email ? normalized(email) : '';
    if (key && !byEmail.has(key)) byEmail.set(key, { email: key, customerId, greetingName });
  };
  add(stop.email, null, stop.name);
  for (const customer of customers) add(customer.email, customer.id, customer.name);
  return [...byEmail.values()];
}

/**
 * Sends the visit notices for one stop on one day, exactly once per recipient: the visit_notices row is unique per
 * stop, day and recipient, and each send happens while that row is locked (FOR UPDATE SKIP LOCKED) and not yet
 * 'sent', so two jobs or two app instances never both send it.
 */
@Injectable()
export class VisitNoticeDelivery {
  private readonly logger = new Logger(VisitNoticeDelivery.name);
  private readonly appUrl: string;

  constructor(
    private readonly dataSource: DataSource,
    private readonly mail: MailService,
    config: ConfigService<AppConfig, true>,
  ) {
    this.appUrl = config.get('APP_URL', { infer: true });
  }

  /** Throws VisitNoticeFailed when any recipient's e-mail failed (those rows are 'failed', the rest 'sent'). */
  async deliver(job: VisitNoticeJob): Promise<DeliveryResult> {
    const visit = await this.plannedVisit(job);
    if (!visit) {
      // The planner moved the stop off that day after the job was queued: nothing to announce for it.
      this.logger.log({ stopId: job.stopId, day: job.day }, 'visit notice skipped: stop no longer on that day');
      return { sent: 0, skipped: 0, failed: 0 };
    }
    const customers = await this.dataSource.getRepository(Customer).find({
      select: { id: true, name: true, email: true },
      where: { stopId: job.stopId, active: true, visitNoticeConsent: true },
      order: { name: 'ASC' },
    });
    const recipients = noticeRecipients({ name: visit.stopName, email: visit.stopEmail }, customers);
    if (recipients.length > 0) {
      await this.dataSource
        .createQueryBuilder()
        .insert()
        .into(VisitNotice)
        .values(
          recipients.map((r) => ({ stopId: job.stopId, day: job.day, recipient: r.email, customerId: r.customerId })),
        )
        .orIgnore()
        .execute();
    }
    const result: DeliveryResult = { sent: 0, skipped: 0, failed: 0 };
    for (const recipient of recipients) {
      result[await this.sendOnce(job, visit, recipient)] += 1;
    }
    if (result.failed > 0) throw new VisitNoticeFailed(job, result.failed);
    return result;
  }

  private async plannedVisit(job: VisitNoticeJob): Promise<PlannedVisit | undefined> {
    return this.dataSource
      .createQueryBuilder()
      .select('stop.id', 'stopId')
      .addSelect('stop.name', 'stopName')
      .addSelect('stop.email', 'stopEmail')
      .addSelect('rds.arrival', 'arrival')
      .from(RouteDayStop, 'rds')
      .innerJoin(RouteDay, 'rd', 'rd.id = rds.route_day_id')
      .innerJoin(Stop, 'stop', 'stop.id = rds.stop_id')
      .where('rds.stop_id = :stopId AND rd.day = :day', job)
      .orderBy('rds.arrival')
      .limit(1)
      .getRawOne<PlannedVisit>();
  }

  private sendOnce(job: VisitNoticeJob, visit: PlannedVisit, recipient: Recipient): Promise<keyof DeliveryResult> {
    return this.dataSource.transaction(async (manager) => {
      const notice = await this.claim(manager, job, recipient.email);
      if (!notice) return 'skipped';
      const mail = visitNoticeMail({
        to: recipient.email,
        greetingName: recipient.greetingName,
        stopName: visit.stopName,
        day: job.day,
        arrival: visit.arrival,
        bookingUrl: bookingUrl(this.appUrl, job.stopId, job.day),
      });
      const accepted = await this.mail.send(mail);
      const attempts = notice.attempts + 1;
      // The log names the notice and stop, not the address: recipients are customers' personal data.
      const where = { noticeId: notice.id, stopId: job.stopId, day: job.day, attempts };
      if (accepted) {
        await manager.update(VisitNotice, notice.id, { status: 'sent', attempts, sentAt: new Date() });
        this.logger.log(where, 'visit notice sent');
        return 'sent';
      }
      await manager.update(VisitNotice, notice.id, {
        status: 'failed',
        attempts,
        // MailService logs the SMTP error itself and answers only yes or no.
        lastError: 'The mail server did not accept the message (the error log has the details).',
      });
      this.logger.warn(where, 'visit notice failed');
      return 'failed';
    });
  }

  /** The row, locked for this transaction, unless it is already sent or another worker holds it. */
  private claim(manager: EntityManager, job: VisitNoticeJob, recipient: string): Promise<VisitNotice | null> {
    return manager
      .createQueryBuilder(VisitNotice, 'notice')
      .setLock('pessimistic_write')
      .setOnLocked('skip_locked')
      .where('notice.stop_id = :stopId AND notice.day = :day AND notice.recipient = :recipient', {
        ...job,
        recipient,
      })
      .andWhere("notice.status <> 'sent'")
      .getOne();
  }
}
