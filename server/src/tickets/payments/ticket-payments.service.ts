import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { TicketAccess } from '../../access/ticket-access';
import { AuditService } from '../../audit/audit.service';
import type { Actor } from '../../auth/actor';
import type { TicketDto } from '../dto/ticket-response.dto';
import { Ticket } from '../entities/ticket.entity';
import { TicketReader } from '../ticket-reader';
import { TicketWriter } from '../ticket-writer';
import type { RecordPaymentDto } from './dto/record-payment.dto';
import { Payment } from '../../payments/entities/payment.entity';
import { checkPayment, checkToInvoice, paidCents } from './settlement';

/** Payments taken on site (cash, cheque, card on a terminal) and "leave it for an invoice". */
@Injectable()
export class TicketPaymentsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: TicketAccess,
    private readonly writer: TicketWriter,
    private readonly reader: TicketReader,
    private readonly audit: AuditService,
  ) {}

  async record(actor: Actor, ticketId: string, dto: RecordPaymentDto): Promise<TicketDto> {
    await this.access.requireTicket(actor, ticketId, 'work');
    await this.dataSource.transaction(async (manager) => {
      const ticket = await this.writer.lock(manager, ticketId);
      const payments = manager.getRepository(Payment);
      const paid = paidCents(await payments.findBy({ ticketId: ticket.id }));
      const reference = dto.method === 'cash' ? '' : (dto.reference ?? '');
      const settlement = checkPayment(ticket, paid, { method: dto.method, amountCents: dto.amountCents, reference });
      const inserted = await payments.insert({
        ticketId: ticket.id,
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
          subject: { type: 'ticket', id: ticket.id },
          detail: { paymentId, method: dto.method, amountCents: dto.amountCents, reference },
        },
        manager,
      );
      if (settlement !== ticket.settlement) await manager.getRepository(Ticket).update(ticket.id, { settlement });
    });
    return this.reader.detail(ticketId);
  }

  async leaveForInvoice(actor: Actor, ticketId: string): Promise<TicketDto> {
    await this.access.requireTicket(actor, ticketId, 'work');
    await this.dataSource.transaction(async (manager) => {
      const ticket = await this.writer.lock(manager, ticketId);
      checkToInvoice(ticket);
      await manager.getRepository(Ticket).update(ticket.id, { settlement: 'to-invoice' });
    });
    return this.reader.detail(ticketId);
  }
}
