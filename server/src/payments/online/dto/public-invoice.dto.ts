import { ApiProperty } from '@nestjs/swagger';
import { INVOICE_STATUSES, type InvoiceStatus } from '../../../invoices/entities/invoice.entity';

export class PublicInvoiceLineDto {
  @ApiProperty() description: string;
  @ApiProperty({ description: 'Integer cents; an adjustment may be negative' }) amountCents: number;
}

export class PublicBusinessDto {
  @ApiProperty() name: string;
  @ApiProperty() email: string;
  @ApiProperty() phone: string;
}

/** What the pay link shows: the invoice as its customer sees it, without internal ids. */
export class PublicInvoiceDto {
  @ApiProperty({ example: 'KR-2026-0001' }) number: string;
  @ApiProperty({ enum: INVOICE_STATUSES }) status: InvoiceStatus;
  @ApiProperty({ description: 'Issued, unpaid and past its due date' }) overdue: boolean;
  @ApiProperty() billToName: string;
  @ApiProperty({ example: '2026-12-03' }) issueDate: string;
  @ApiProperty({ example: '2026-12-17' }) dueDate: string;
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty() totalCents: number;
  @ApiProperty() paidCents: number;
  @ApiProperty() creditedCents: number;
  @ApiProperty({ description: 'What is still owed; 0 when paid or void' }) balanceCents: number;
  @ApiProperty({ type: [PublicInvoiceLineDto] }) lines: PublicInvoiceLineDto[];
  @ApiProperty() taxCents: number;
  @ApiProperty({ type: PublicBusinessDto }) business: PublicBusinessDto;
  @ApiProperty({ example: '/api/public/invoices/<token>/pdf' }) pdfUrl: string;
  @ApiProperty({ description: 'Something is owed and the invoice is open, so the online checkout is offered' })
  canPayOnline: boolean;
}

/** What the "done" page polls: it shows paid only when the webhook has recorded the money. */
export class PublicInvoiceStatusDto {
  @ApiProperty({ enum: INVOICE_STATUSES }) status: InvoiceStatus;
  @ApiProperty() balanceCents: number;
  @ApiProperty() paidCents: number;
}

export class CheckoutStartedDto {
  @ApiProperty({ description: "The payment service's hosted checkout page" }) url: string;
}
