import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { InvoiceDocumentsModule } from '../invoices/documents/invoice-documents.module';
import { InvoicesModule } from '../invoices/invoices.module';
import { InvoiceCheckout } from './entities/invoice-checkout.entity';
import { PaymentEvent } from './entities/payment-event.entity';
import { Payment } from './entities/payment.entity';
import { InvoicePaymentsController } from './manual/invoice-payments.controller';
import { InvoicePaymentsService } from './manual/invoice-payments.service';
import { InvoiceCheckouts } from './online/invoice-checkouts';
import { PublicInvoicesController } from './online/public-invoices.controller';
import { PublicInvoicesService } from './online/public-invoices.service';
import { PaymentReceipts } from './receipts/payment-receipts';
import { stripeClientProvider } from './stripe-client';
import { PaymentEvents } from './webhooks/payment-events';
import { StripeWebhookController } from './webhooks/stripe-webhook.controller';

/** Money in against invoices: by hand, or online through the payment service's checkout and its signed webhooks. */
@Module({
  imports: [
    TypeOrmModule.forFeature([Payment, InvoiceCheckout, PaymentEvent]),
    InvoicesModule,
    InvoiceDocumentsModule,
    AuditModule,
  ],
  controllers: [PublicInvoicesController, StripeWebhookController, InvoicePaymentsController],
  providers: [
    stripeClientProvider,
    PublicInvoicesService,
    InvoiceCheckouts,
    PaymentEvents,
    PaymentReceipts,
    InvoicePaymentsService,
  ],
  exports: [PaymentReceipts],
})
export class PaymentsModule {}
