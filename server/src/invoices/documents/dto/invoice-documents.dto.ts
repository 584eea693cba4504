import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsOptional, MaxLength } from 'class-validator';
import { INVOICE_MAIL_KINDS, type InvoiceMailKind } from '../../entities/invoice-mail.entity';

const lowerOrUndefined = ({ value }: { value: unknown }): unknown => {
  if (typeof value !== 'string') return value;
  const text = value.trim().toLowerCase();
  return text === '' ? undefined : text;
};

export class SendInvoiceDto {
  @ApiPropertyOptional({
    example: 'front-desk@pine-street.demo.test',
    description: "Where to send it; the invoice's bill-to e-mail when left out",
  })
  @IsOptional()
  @Transform(lowerOrUndefined)
  @IsEmail({}, { message: 'Enter a valid e-mail address to send the invoice to.' })
  @MaxLength(254, { message: 'Enter a valid e-mail address to send the invoice to.' })
  to?: string;
}

/** One row of an invoice's send log. */
export class InvoiceMailDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: INVOICE_MAIL_KINDS }) kind: InvoiceMailKind;
  @ApiProperty() toEmail: string;
  @ApiProperty() subject: string;
  @ApiProperty({ enum: ['queued', 'sent', 'failed'], description: "'queued' until the mail queue has tried it" })
  status: 'queued' | 'sent' | 'failed';
  @ApiProperty({ nullable: true, type: String, description: "The mail relay's reason when it failed" })
  error: string | null;
  @ApiProperty() createdAt: string;
}
