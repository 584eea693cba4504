import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { dueDate, formatMoney } from '@keenroute/shared';
import { IsNull, Not, type DataSource, type EntityManager } from 'typeorm';
import { InvoiceAccess } from '../access/invoice-access';
import { AuditService } from '../audit/audit.service';
import type { Actor } from '../auth/actor';
import { DomainError } from '../common/errors/domain-error';
import { Payment } from '../payments/entities/payment.entity';
import { Ticket } from '../tickets/entities/ticket.entity';
import type { CreateCreditNoteDto } from './dto/create-credit-note.dto';
import type { CreateInvoiceDto } from './dto/create-invoice.dto';
import type { InvoiceDto } from './dto/invoice-response.dto';
import type { UpdateInvoiceDto } from './dto/update-invoice.dto';
import type { VoidInvoiceDto } from './dto/void-invoice.dto';
import { BusinessProfile } from './entities/business-profile.entity';
import { CreditNote } from './entities/credit-note.entity';
import { Invoice } from './entities/invoice.entity';
import { billToSnapshot } from './invoice-bill-to';
import { InvoiceDrafts } from './invoice-drafts';
import { lockInvoice, settleInvoice } from './invoice-ledger';
import { takeDocumentNumber } from './invoice-numbering';
import { InvoiceReader } from './invoice-reader';

/** Used when the business profile row is missing (it never should be: the migration writes it). */
const DEFAULT_TERMS_DAYS = 14;

/**
 * An invoice's life: a draft from tickets, issued with the next number, paid down by payments and credit notes, or
 * void with a reason. Sent invoices are never deleted; every money change runs lockInvoice … settleInvoice in one
 * transaction.
 */
@Injectable()
export class InvoicesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: InvoiceAccess,
    private readonly drafts: InvoiceDrafts,
    private readonly reader: InvoiceReader,
    private readonly audit: AuditService,
  ) {}

  async create(actor: Actor, dto: CreateInvoiceDto): Promise<InvoiceDto> {
    return this.reader.detail(await this.drafts.create(actor, dto));
  }

  async update(actor: Actor, id: string, dto: UpdateInvoiceDto): Promise<InvoiceDto> {
    await this.access.requireInvoice(actor, id, 'manage');
    await this.drafts.update(id, dto);
    return this.reader.detail(id);
  }

  async remove(actor: Actor, id: string): Promise<void> {
    await this.access.requireInvoice(actor, id, 'manage');
    await this.drafts.remove(id);
  }

  /**
   * Gives a draft its number, dates and bill-to, and counts the payments taken on site for its tickets; an issued
   * invoice comes back as it is. With a manager it runs inside the caller's transaction (sending issues a draft first).
   */
  async issue(actor: Actor, id: string, manager?: EntityManager): Promise<InvoiceDto> {
    await this.access.requireInvoice(actor, id, 'manage');
    if (manager) {
      await this.issueLocked(manager, id);
      return this.reader.detail(id, manager);
    }
    await this.dataSource.transaction((tx) => this.issueLocked(tx, id));
    return this.reader.detail(id);
  }

  async void(actor: Actor, id: string, dto: VoidInvoiceDto): Promise<InvoiceDto> {
    await this.access.requireInvoice(actor, id, 'manage');
    await this.dataSource.transaction(async (manager) => {
      const invoice = await lockInvoice(manager, id);
      if (invoice.status === 'draft') {
        throw new DomainError('conflict', 'A draft is deleted, not voided; nothing was sent yet.');
      }
      if (invoice.status === 'void') throw new DomainError('conflict', `Invoice ${invoice.number} is already void.`);
      const paidOnInvoice = await manager
        .getRepository(Payment)
        .exists({ where: { invoiceId: id, ticketId: IsNull() } });
      if (paidOnInvoice) {
        throw new DomainError(
          'conflict',
          `A payment was recorded against invoice ${invoice.number}; issue a credit note instead of voiding it.`,
        );
      }
      if (await manager.getRepository(CreditNote).exists({ where: { invoiceId: id } })) {
        throw new DomainError(
          'conflict',
          `Invoice ${invoice.number} has a credit note; credit what is left instead of voiding it.`,
        );
      }
      // Written before the void itself: should either fail, neither commits.
      await this.audit.record(
        {
          action: 'invoice-voided',
          actor,
          subject: { type: 'invoice', id },
          detail: { number: invoice.number, from: invoice.status, totalCents: invoice.totalCents, reason: dto.reason },
        },
        manager,
      );
      // The tickets go back to "ready to invoice" (still left for an invoice); their on-site payments go with them.
      await manager.getRepository(Ticket).update({ invoiceId: id }, { invoiceId: null });
      await manager.getRepository(Payment).update({ invoiceId: id, ticketId: Not(IsNull()) }, { invoiceId: null });
      Object.assign(invoice, { status: 'void', voidReason: dto.reason, voidedAt: new Date(), voidedBy: actor.id });
      await manager.getRepository(Invoice).save(invoice);
      await settleInvoice(manager, invoice);
    });
    return this.reader.detail(id);
  }

  async creditNote(actor: Actor, id: string, dto: CreateCreditNoteDto): Promise<InvoiceDto> {
    await this.access.requireInvoice(actor, id, 'manage');
    await this.dataSource.transaction(async (manager) => {
      const invoice = await lockInvoice(manager, id);
      if (invoice.status === 'draft') {
        throw new DomainError('conflict', 'Issue the invoice first; a draft is changed, not credited.');
      }
      if (invoice.status === 'void') {
        throw new DomainError('conflict', `Invoice ${invoice.number} is void; there is nothing to credit.`);
      }
      const creditable = invoice.totalCents - invoice.creditedCents;
      if (dto.amountCents > creditable) {
        const message =
          creditable > 0
            ? `At most ${formatMoney(creditable, invoice.currency)} can still be credited on this invoice.`
            : 'This invoice is credited in full already.';
        throw new DomainError('invalid_input', message, { amountCents: [message] });
      }
      const number = await takeDocumentNumber(manager, 'CN', yearOf(this.reader.today()));
      const inserted = await manager.getRepository(CreditNote).insert({
        number,
        invoiceId: id,
        amountCents: dto.amountCents,
        reason: dto.reason,
        refundMethod: dto.refundMethod,
        createdBy: actor.id,
      });
      await this.audit.record(
        {
          action: 'credit-note-issued',
          actor,
          subject: { type: 'invoice', id },
          detail: {
            creditNoteId: (inserted.identifiers[0] as { id: string }).id,
            number,
            invoiceNumber: invoice.number,
            amountCents: dto.amountCents,
            refundMethod: dto.refundMethod,
            reason: dto.reason,
          },
        },
        manager,
      );
      await settleInvoice(manager, invoice);
    });
    return this.reader.detail(id);
  }

  private async issueLocked(manager: EntityManager, id: string): Promise<Invoice> {
    const invoice = await lockInvoice(manager, id);
    if (invoice.status !== 'draft') return invoice;
    const profile = await manager.getRepository(BusinessProfile).findOneBy({ id: 1 });
    const termsDays = profile?.paymentTermsDays ?? DEFAULT_TERMS_DAYS;
    const today = this.reader.today();
    const snapshot = await billToSnapshot(manager, invoice);
    await manager.query(
      `UPDATE payments SET invoice_id = $1
        WHERE invoice_id IS NULL AND ticket_id IN (SELECT id FROM tickets WHERE invoice_id = $1)`,
      [id],
    );
    // Taken as late as it can be: the counter row stays locked until commit, and other issuers wait on it.
    const number = await takeDocumentNumber(manager, 'KR', yearOf(today));
    Object.assign(invoice, snapshot, {
      number,
      status: 'sent',
      issueDate: today,
      dueDate: dueDate(today, termsDays),
      termsDays,
    });
    await manager.getRepository(Invoice).save(invoice);
    return settleInvoice(manager, invoice);
  }
}

const yearOf = (day: string) => Number(day.slice(0, 4));
