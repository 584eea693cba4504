import { Global, Module, type OnApplicationBootstrap } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { JobsService } from '../jobs/jobs.service';
import { OutboxMail } from './entities/outbox-mail.entity';
import { MAIL_SEND_QUEUE, MailOutbox, type MailJob } from './mail-outbox';
import { MailService } from './mail.service';
import { MailSendFailed, OutboxDelivery } from './outbox-delivery';

/** E-mail for every feature: MailOutbox queues a message, OutboxDelivery works the 'mail.send' queue over SMTP. */
@Global()
@Module({
  imports: [TypeOrmModule.forFeature([OutboxMail])],
  providers: [MailService, MailOutbox, OutboxDelivery],
  exports: [MailService, MailOutbox],
})
export class MailModule implements OnApplicationBootstrap {
  constructor(
    private readonly jobs: JobsService,
    private readonly outbox: MailOutbox,
    private readonly delivery: OutboxDelivery,
  ) {}

  /** After every module's onModuleInit: the features have registered their outcome handlers and renderers by now. */
  async onApplicationBootstrap(): Promise<void> {
    const { retryLimit, retryDelay, retryBackoff, expireInSeconds } = this.outbox.settings;
    await this.jobs.createQueue(MAIL_SEND_QUEUE, { retryLimit, retryDelay, retryBackoff, expireInSeconds });
    // Ten per fetch and a fetch every second: a booking confirmation does not wait behind a queue of other mail.
    await this.jobs.work<MailJob>(
      MAIL_SEND_QUEUE,
      async (job) => {
        const outcome = await this.delivery.deliver(job.data);
        if (outcome === 'retry') throw new MailSendFailed(job.data, 'the mail relay refused it');
      },
      { batchSize: 10, pollingIntervalSeconds: 1 },
    );
  }
}
