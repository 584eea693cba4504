import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import { OutboxMail } from './entities/outbox-mail.entity';
import { MAIL_MAX_ATTEMPTS, MailOutbox, type MailJob } from './mail-outbox';
import { MailService, type MailAttachment } from './mail.service';

/**
 * How one try went. taken: already sent or given up on, or another worker holds it right now; retry: the relay
 * refused it and the row stays queued for pg-boss's next try.
 */
export type OutboxOutcome = 'sent' | 'failed' | 'retry' | 'taken';

/** Thrown after the failed try is recorded, so pg-boss tries the job again later (with backoff). */
export class MailSendFailed extends Error {
  constructor(job: MailJob, reason: string) {
    super(`Queued e-mail ${job.outboxId} could not be sent (${reason}); pg-boss retries.`);
    this.name = 'MailSendFailed';
  }
}

const ERROR_MAX = 500;

/**
 * Delivers one outbox row, once: it is sent only while locked (FOR UPDATE SKIP LOCKED) and still 'queued', and marked
 * sent in that same transaction, so a second job, a second instance or a retry after a success never sends it again.
 * A worker killed mid-send holds no lock any more (PostgreSQL ends its transaction), so the retried job can take it.
 */
@Injectable()
export class OutboxDelivery {
  private readonly logger = new Logger(OutboxDelivery.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly outbox: MailOutbox,
    private readonly mail: MailService,
  ) {}

  deliver(job: MailJob): Promise<OutboxOutcome> {
    return this.dataSource.transaction(async (manager) => {
      const row = await this.claim(manager, job.outboxId);
      if (!row) return 'taken';
      const attempts = row.attempts + 1;
      // The log names the row and its feature, not the address: recipients are customers' personal data.
      const where = { outboxId: row.id, topic: row.topic, refId: row.refId, attempts };
      this.logger.log(where, 'e-mail delivery started');
      const result = await this.mail.deliver({
        to: row.toName ? { name: row.toName, address: row.toEmail } : row.toEmail,
        subject: row.subject,
        text: row.text,
        html: row.html ?? undefined,
        attachments: row.attachment ? [await this.attachment(row, manager)] : undefined,
      });
      const final = !result.ok && attempts >= MAIL_MAX_ATTEMPTS;
      const outcome: OutboxOutcome = result.ok ? 'sent' : final ? 'failed' : 'retry';
      await manager.update(OutboxMail, row.id, {
        status: outcome === 'retry' ? 'queued' : outcome,
        attempts,
        sentAt: result.ok ? new Date() : null,
        lastError: result.ok ? null : result.error.slice(0, ERROR_MAX) || 'The mail relay gave no reason.',
        ...(outcome === 'retry' ? {} : { text: '', html: null }),
      });
      const updated = await manager.findOneByOrFail(OutboxMail, { id: row.id });
      await this.outbox.outcomeHandler(row.topic)?.(updated, manager);
      if (outcome === 'sent') this.logger.log(where, 'e-mail sent');
      else this.logger.warn(where, final ? 'e-mail failed for good' : 'e-mail refused; tried again later');
      return outcome;
    });
  }

  private async attachment(row: OutboxMail, manager: EntityManager): Promise<MailAttachment> {
    const ref = row.attachment!;
    const render = this.outbox.renderer(ref.kind);
    if (!render) throw new Error(`No renderer for "${ref.kind}" attachments is registered with the mail outbox.`);
    return render(ref.id, manager);
  }

  private claim(manager: EntityManager, outboxId: string): Promise<OutboxMail | null> {
    return manager
      .createQueryBuilder(OutboxMail, 'mail')
      .setLock('pessimistic_write')
      .setOnLocked('skip_locked')
      .where('mail.id = :outboxId', { outboxId })
      .andWhere("mail.status = 'queued'")
      .getOne();
  }
}
