import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { InvoiceAccess } from '../../access/invoice-access';
import { AuditService } from '../../audit/audit.service';
import type { Actor } from '../../auth/actor';
import type { InvoiceDto } from '../../invoices/dto/invoice-response.dto';
import { lockInvoice, settleInvoice } from '../../invoices/invoice-ledger';
import { InvoiceReader } from '../../invoices/invoice-reader';
import { Payment } from '../entities/payment.entity';
import { PaymentReceipts } from '../receipts/payment-receipts';
import { checkInvoicePayment } from './check-invoice-payment';
import type { RecordInvoicePaymentDto } from './dto/record-invoice-payment.dto';

/** Payments taken by hand against an invoice (cash, cheque, card on a terminal), part or whole. */
@Injectable()
export class InvoicePaymentsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: InvoiceAccess,
    private readonly reader: InvoiceReader,
    private readonly receipts: PaymentReceipts,
    private readonly audit: AuditService,
  ) {}

  async record(actor: Actor, invoiceId: string, dto: RecordInvoicePaymentDto): Promise<InvoiceDto> {
    await this.access.requireInvoice(actor, invoiceId, 'take-payment');
    const reference = dto.method === 'cash' ? '' : (dto.reference ?? '');
    const paymentId = await this.dataSource.transaction(async (manager) => {
      // Under the lock, so two people recording at once cannot both take the last of the balance.
      const invoice = await lockInvoice(manager, invoiceId);
      checkInvoicePayment(invoice, { method: dto.method, amountCents: dto.amountCents, reference });
      const inserted = await manager.getRepository(Payment).insert({
        invoiceId,
        ticketId: null,
        method: dto.method,
        amountCents: dto.amountCents,
        reference,
        recordedBy: actor.id,
      });
      const paymentId = (inserted.identifiers[0] as { id: string }).id;
      await this.audit.record(
        {
          action: 'payment-recorded',
          actor,
          subject: { type: 'invoice', id: invoiceId },
          detail: {
            paymentId,
            invoiceNumber: invoice.number,
            method: dto.method,
            amountCents: dto.amountCents,
            reference,
          },
        },
        manager,
      );
      await settleInvoice(manager, invoice);
      return paymentId;
    });
    // After the commit: no receipt for money a rollback took back; a failed send is in the send log, the payment stands.
    if (dto.sendReceipt) await this.receipts.sendQuietly(paymentId, actor.id);
    return this.reader.detail(invoiceId);
  }
}
