import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import type { Address } from 'nodemailer/lib/mailer';
import type { AppConfig } from '../config/environment';
import { JobsService, type SendOptions } from '../jobs/jobs.service';
import { OutboxMail, type OutboxAttachmentRef } from './entities/outbox-mail.entity';
import type { MailAttachment } from './mail.service';

export const MAIL_SEND_QUEUE = 'mail.send';

/** Tries after the first: with 30 s doubling, a relay may be down for about two hours before a message is 'failed'. */
export const MAIL_RETRY_LIMIT = 8;
export const MAIL_MAX_ATTEMPTS = MAIL_RETRY_LIMIT + 1;
/** pg-boss counts a worker that died holding the job as a try too; these spare ones keep such a job going. */
const SPARE_JOB_RETRIES = 3;

/** What one 'mail.send' job carries: only the outbox row's id (the body may be large and is personal data). */
export interface MailJob {
  outboxId: string;
}

export interface QueuedMail {
  /** Stable per message: the same key queued again adds no second row, job or e-mail. */
  key: string;
  topic: string;
  refId?: string | null;
  to: string | Address;
  subject: string;
  text: string;
  html?: string;
  attachment?: OutboxAttachmentRef;
}

/** Records how a message went where its feature keeps it, in the same transaction that marks the outbox row. */
export type OutcomeHandler = (mail: OutboxMail, manager: EntityManager) => Promise<void>;
/** Renders an attachment when the message goes out, from the id it was queued with. */
export type AttachmentRenderer = (id: string, manager: EntityManager) => Promise<MailAttachment>;

/**
 * The way every feature sends e-mail: the message is written to mail_outbox and a 'mail.send' job is queued in the same
 * transaction, so a request answers at once whatever the relay is doing, and a message is never lost between the two.
 * OutboxDelivery works the queue.
 */
@Injectable()
export class MailOutbox {
  private readonly outcomes = new Map<string, OutcomeHandler>();
  private readonly renderers = new Map<string, AttachmentRenderer>();
  private readonly jobOptions: SendOptions;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jobs: JobsService,
    config: ConfigService<AppConfig, true>,
  ) {
    this.jobOptions = {
      retryLimit: MAIL_RETRY_LIMIT + SPARE_JOB_RETRIES,
      retryDelay: config.get('MAIL_RETRY_DELAY_SECONDS', { infer: true }),
      retryBackoff: true,
      expireInSeconds: config.get('MAIL_JOB_EXPIRE_SECONDS', { infer: true }),
    };
  }

  /** Settings every mail job is queued with (the queue keeps the same as its defaults). */
  get settings(): SendOptions {
    return this.jobOptions;
  }

  onOutcome(topic: string, handler: OutcomeHandler): void {
    this.outcomes.set(topic, handler);
  }

  outcomeHandler(topic: string): OutcomeHandler | undefined {
    return this.outcomes.get(topic);
  }

  renderAttachments(kind: string, renderer: AttachmentRenderer): void {
    this.renderers.set(kind, renderer);
  }

  renderer(kind: string): AttachmentRenderer | undefined {
    return this.renderers.get(kind);
  }

  /** Queues the message (inside the caller's transaction when given); the row, new or the one already queued. */
  async queue(mail: QueuedMail, manager?: EntityManager): Promise<OutboxMail> {
    if (!manager) return this.dataSource.transaction((own) => this.queue(mail, own));
    if (mail.attachment && !this.renderers.has(mail.attachment.kind)) {
      throw new Error(`No renderer for "${mail.attachment.kind}" attachments is registered with the mail outbox.`);
    }
    const to = typeof mail.to === 'string' ? { address: mail.to, name: null } : mail.to;
    const inserted = await manager
      .createQueryBuilder()
      .insert()
      .into(OutboxMail)
      .values({
        key: mail.key,
        topic: mail.topic,
        refId: mail.refId ?? null,
        toEmail: to.address,
        toName: to.name || null,
        subject: mail.subject,
        text: mail.text,
        html: mail.html ?? null,
        attachment: mail.attachment ?? null,
        status: 'queued',
        attempts: 0,
      })
      .orIgnore()
      .returning(['id'])
      .execute();
    const id = (inserted.raw as { id: string }[])[0]?.id;
    if (id) {
      // The job's id is the row's: pg-boss keeps one job per id, a second line of defence against a double send.
      await this.jobs.send<MailJob>(MAIL_SEND_QUEUE, { outboxId: id }, { ...this.jobOptions, id, manager });
    }
    return manager.getRepository(OutboxMail).findOneByOrFail({ key: mail.key });
  }
}
