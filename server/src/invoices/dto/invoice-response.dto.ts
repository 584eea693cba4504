import { ApiProperty } from '@nestjs/swagger';
import { RefDto } from '../../customers/dto/ref.dto';
import { PAYMENT_METHODS, type PaymentMethod } from '../../payments/entities/payment.entity';
import { REFUND_METHODS, type RefundMethod } from '../entities/credit-note.entity';
import { INVOICE_LINE_KINDS, type InvoiceLineKind } from '../entities/invoice-line.entity';
import { BILL_TO, INVOICE_STATUSES, type BillTo, type InvoiceStatus } from '../entities/invoice.entity';

/** One invoice as a list shows it. */
export class InvoiceSummaryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ nullable: true, type: String, example: 'KR-2026-0001', description: 'Null while a draft' })
  number: string | null;
  @ApiProperty({ enum: INVOICE_STATUSES }) status: InvoiceStatus;
  @ApiProperty({ description: 'Issued, unpaid and past its due date (derived, never stored)' }) overdue: boolean;
  @ApiProperty({ description: 'Whole days past the due date; 0 when not overdue' }) daysOverdue: number;
  @ApiProperty({ enum: BILL_TO }) billTo: BillTo;
  @ApiProperty({ example: 'Pine Street Salon (demo)' }) billToName: string;
  @ApiProperty({ nullable: true, type: String, example: '2026-12-03' }) issueDate: string | null;
  @ApiProperty({ nullable: true, type: String, example: '2026-12-17' }) dueDate: string | null;
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty() totalCents: number;
  @ApiProperty({ description: 'Total less payments and credit notes' }) balanceCents: number;
  @ApiProperty() createdAt: string;
}

export class InvoiceListDto {
  @ApiProperty({ type: [InvoiceSummaryDto] }) items: InvoiceSummaryDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

export class InvoiceTaxGroupDto {
  @ApiProperty({ example: 825 }) taxRateBp: number;
  @ApiProperty() taxableCents: number;
  @ApiProperty() taxCents: number;
}

export class InvoiceLineDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid', nullable: true, type: String }) ticketId: string | null;
  @ApiProperty() position: number;
  @ApiProperty({ enum: INVOICE_LINE_KINDS }) kind: InvoiceLineKind;
  @ApiProperty() description: string;
  @ApiProperty({ description: 'May be negative (a ticket’s multi-pair discount)' }) amountCents: number;
  @ApiProperty() taxable: boolean;
  @ApiProperty() taxRateBp: number;
}

export class InvoiceTicketDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: '2026-12-03' }) visitDay: string;
  @ApiProperty({ nullable: true, type: String }) stopName: string | null;
  @ApiProperty() customerName: string;
  @ApiProperty() totalCents: number;
}

export class InvoicePaymentDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: PAYMENT_METHODS }) method: PaymentMethod;
  @ApiProperty() amountCents: number;
  @ApiProperty() reference: string;
  @ApiProperty() recordedAt: string;
  @ApiProperty({ description: 'Taken on site against one of the tickets, before the invoice' }) onSite: boolean;
}

export class InvoiceCreditNoteDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'CN-2026-0001' }) number: string;
  @ApiProperty() amountCents: number;
  @ApiProperty() reason: string;
  @ApiProperty({ enum: REFUND_METHODS }) refundMethod: RefundMethod;
  @ApiProperty() createdAt: string;
}

/** One invoice with everything on it. */
export class InvoiceDto extends InvoiceSummaryDto {
  @ApiProperty({ type: RefDto, nullable: true }) customer: RefDto | null;
  @ApiProperty({ type: RefDto, nullable: true }) stop: RefDto | null;
  @ApiProperty({ nullable: true, type: String }) billToEmail: string | null;
  @ApiProperty({ description: 'Lines of the postal address, joined by line breaks' }) billToAddress: string;
  @ApiProperty({ description: 'Days from issue to due' }) termsDays: number;
  @ApiProperty({ description: 'Discount asked for, basis points' }) discountBp: number;
  @ApiProperty({ description: 'Discount asked for, cents' }) discountCents: number;
  @ApiProperty({ description: 'Sum of the lines' }) linesCents: number;
  @ApiProperty({ description: 'The discount taken, cents' }) discountTotalCents: number;
  @ApiProperty() subtotalCents: number;
  @ApiProperty() taxCents: number;
  @ApiProperty({ type: [InvoiceTaxGroupDto] }) taxGroups: InvoiceTaxGroupDto[];
  @ApiProperty() paidCents: number;
  @ApiProperty() creditedCents: number;
  @ApiProperty() notes: string;
  @ApiProperty({ nullable: true, type: String }) voidReason: string | null;
  @ApiProperty({ nullable: true, type: String }) voidedAt: string | null;
  @ApiProperty({ nullable: true, type: String, description: 'When it was first e-mailed' }) sentAt: string | null;
  @ApiProperty({ description: 'Send it back with a change; a newer invoice refuses it (409)' }) version: number;
  @ApiProperty({ type: [InvoiceLineDto] }) lines: InvoiceLineDto[];
  @ApiProperty({ type: [InvoiceTicketDto] }) tickets: InvoiceTicketDto[];
  @ApiProperty({ type: [InvoicePaymentDto] }) payments: InvoicePaymentDto[];
  @ApiProperty({ type: [InvoiceCreditNoteDto] }) creditNotes: InvoiceCreditNoteDto[];
  @ApiProperty({ nullable: true, type: String, description: 'The private pay link while something is owed' })
  payUrl: string | null;
}

export class ReadyTicketDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: '2026-12-03' }) visitDay: string;
  @ApiProperty({ nullable: true, type: String }) stopName: string | null;
  @ApiProperty() customerName: string;
  @ApiProperty() totalCents: number;
  @ApiProperty({ description: 'Taken on site already; counts on the invoice' }) paidCents: number;
}

/** Finished tickets left for an invoice, grouped by who pays. */
export class ReadyGroupDto {
  @ApiProperty({ enum: BILL_TO }) billTo: BillTo;
  @ApiProperty({ format: 'uuid', nullable: true, type: String }) customerId: string | null;
  @ApiProperty({ format: 'uuid', nullable: true, type: String }) stopId: string | null;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) email: string | null;
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty({ type: [ReadyTicketDto] }) tickets: ReadyTicketDto[];
  @ApiProperty() totalCents: number;
  @ApiProperty() paidCents: number;
}
