import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createTransport, type Transporter } from 'nodemailer';
import type { Address } from 'nodemailer/lib/mailer';
import type { AppConfig } from '../config/environment';

export interface MailAttachment {
  filename: string;
  content: Buffer;
  contentType: string;
}

export interface OutgoingMail {
  /** An address object keeps a person's name out of the header text nodemailer writes. */
  to: string | Address;
  subject: string;
  text: string;
  html?: string;
  attachments?: MailAttachment[];
}

/** How one delivery went; the error text is kept so a send log can say why a message did not go. */
export type DeliveryResult = { ok: true; messageId: string } | { ok: false; error: string };

/** Sends e-mail over SMTP (the local mail catcher in development and tests, a real relay in production). */
@Injectable()
export class MailService {
  private readonly logger = new Logger(MailService.name);
  private readonly transport: Transporter;
  private readonly from: string;

  constructor(config: ConfigService<AppConfig, true>) {
    this.from = config.get('MAIL_FROM', { infer: true });
    this.transport = createTransport({
      host: config.get('SMTP_HOST', { infer: true }),
      port: config.get('SMTP_PORT', { infer: true }),
      secure: false,
      ignoreTLS: config.get('NODE_ENV', { infer: true }) !== 'production',
      connectionTimeout: 5000,
    });
  }

  /** nodemailer builds the headers itself, so a name or subject with line breaks cannot inject a header. */
  async send(mail: OutgoingMail): Promise<boolean> {
    return (await this.deliver(mail)).ok;
  }

  /** Like send, but says why a message failed (refused recipient, relay down …) instead of only that it did. */
  async deliver(mail: OutgoingMail): Promise<DeliveryResult> {
    try {
      const info = (await this.transport.sendMail({ from: this.from, ...mail })) as { messageId?: string };
      return { ok: true, messageId: info.messageId ?? '' };
    } catch (error) {
      this.logger.error({ err: error, to: mail.to, subject: mail.subject }, 'e-mail could not be sent');
      return { ok: false, error: error instanceof Error ? error.message : String(error) };
    }
  }
}
