import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { Payment } from '../payments/entities/payment.entity';
import { Ticket } from '../tickets/entities/ticket.entity';
import { TicketLine } from '../tickets/entities/ticket-line.entity';
import { BusinessProfile } from './entities/business-profile.entity';
import { CreditNote } from './entities/credit-note.entity';
import { InvoiceLine } from './entities/invoice-line.entity';
import { InvoiceMail } from './entities/invoice-mail.entity';
import { InvoiceReminder } from './entities/invoice-reminder.entity';
import { Invoice } from './entities/invoice.entity';
import { InvoiceDrafts } from './invoice-drafts';
import { InvoiceLists } from './invoice-lists';
import { InvoicePayLink } from './invoice-pay-link';
import { InvoiceReader } from './invoice-reader';
import { InvoicesController } from './invoices.controller';
import { InvoicesService } from './invoices.service';

/** Invoices made from finished tickets: drafts, numbering, credit notes and voids; the pay link. */
@Module({
  imports: [
    TypeOrmModule.forFeature([
      Invoice,
      InvoiceLine,
      CreditNote,
      BusinessProfile,
      InvoiceReminder,
      InvoiceMail,
      Payment,
      Ticket,
      TicketLine,
    ]),
    AuditModule,
  ],
  controllers: [InvoicesController],
  providers: [InvoicePayLink, InvoiceReader, InvoiceLists, InvoiceDrafts, InvoicesService],
  exports: [InvoicePayLink, InvoiceReader, InvoicesService],
})
export class InvoicesModule {}
