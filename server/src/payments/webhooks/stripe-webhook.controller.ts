import { Controller, Headers, HttpCode, Inject, Logger, Post, Req, type RawBodyRequest } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ApiBadRequestResponse, ApiExcludeController } from '@nestjs/swagger';
import type { Request } from 'express';
import type Stripe from 'stripe';
import { Public } from '../../auth/decorators/public.decorator';
import { DomainError } from '../../common/errors/domain-error';
import type { AppConfig } from '../../config/environment';
import { PaymentReceipts } from '../receipts/payment-receipts';
import { STRIPE_CLIENT } from '../stripe-client';
import { PaymentEvents } from './payment-events';

/**
 * Where the payment service reports checkouts. Open to the internet but trusted only through the signature over the
 * exact bytes received (the SDK's check, 300 s tolerance); not rate limited, since the service retries what we refuse.
 */
@ApiExcludeController()
@Public()
@Controller('webhooks')
export class StripeWebhookController {
  private readonly logger = new Logger(StripeWebhookController.name);
  private readonly secret: string;

  constructor(
    @Inject(STRIPE_CLIENT) private readonly stripe: Stripe,
    private readonly events: PaymentEvents,
    private readonly receipts: PaymentReceipts,
    config: ConfigService<AppConfig, true>,
  ) {
    this.secret = config.get('STRIPE_WEBHOOK_SECRET', { infer: true });
  }

  @Post('stripe')
  @HttpCode(200)
  @ApiBadRequestResponse({ description: 'The signature is missing, does not match, or is older than 5 minutes' })
  async receive(
    @Req() request: RawBodyRequest<Request>,
    @Headers('stripe-signature') signature: string | undefined,
  ): Promise<{ received: true; duplicate?: true }> {
    const event = this.verified(request.rawBody, signature);
    const outcome = await this.events.handle(event);
    if (outcome.duplicate) return { received: true, duplicate: true };
    // After the commit: the payment stands whether or not the receipt goes out (the send log says which).
    if (outcome.paymentId) await this.receipts.sendQuietly(outcome.paymentId);
    return { received: true };
  }

  private verified(raw: Buffer | undefined, signature: string | undefined): Stripe.Event {
    if (!raw || !signature) {
      throw new DomainError('invalid_input', 'A payment-service event needs its raw body and Stripe-Signature header.');
    }
    try {
      return this.stripe.webhooks.constructEvent(raw, signature, this.secret);
    } catch (error) {
      this.logger.warn({ reason: error instanceof Error ? error.message : String(error) }, 'webhook refused');
      throw new DomainError(
        'invalid_input',
        'The event signature does not match this endpoint, or it is more than 5 minutes old.',
      );
    }
  }
}
