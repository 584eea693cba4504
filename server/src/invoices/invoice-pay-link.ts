import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createHmac, timingSafeEqual } from 'node:crypto';
import type { AppConfig } from '../config/environment';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

/**
 * The private pay link of an invoice: its id and an HMAC of it under a key derived from the server secret. Nothing is
 * stored, the link can be printed again on a resend, and without the secret it cannot be guessed or forged.
 */
@Injectable()
export class InvoicePayLink {
  private readonly key: Buffer;
  private readonly appUrl: string;

  constructor(config: ConfigService<AppConfig, true>) {
    this.key = createHmac('sha256', config.get('JWT_SECRET', { infer: true }))
      .update('keenroute invoice pay link')
      .digest();
    this.appUrl = config.get('APP_URL', { infer: true }).replace(/\/+$/, '');
  }

  token(invoiceId: string): string {
    return `${invoiceId}.${this.signature(invoiceId)}`;
  }

  url(invoiceId: string): string {
    return `${this.appUrl}/pay/${this.token(invoiceId)}`;
  }

  /** The invoice id a token names, or null when the token is malformed or its signature does not match. */
  invoiceIdFor(token: string): string | null {
    const [invoiceId, signature, extra] = token.split('.');
    if (extra !== undefined || !invoiceId || !signature || !UUID.test(invoiceId)) return null;
    const expected = Buffer.from(this.signature(invoiceId));
    const given = Buffer.from(signature);
    return given.length === expected.length && timingSafeEqual(given, expected) ? invoiceId : null;
  }

  private signature(invoiceId: string): string {
    return createHmac('sha256', this.key).update(invoiceId).digest('base64url');
  }
}
