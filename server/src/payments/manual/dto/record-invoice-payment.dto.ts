import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { RecordPaymentDto } from '../../../tickets/payments/dto/record-payment.dto';

/** A payment taken by hand against an invoice: the on-site payment's fields, and whether to e-mail a receipt. */
export class RecordInvoicePaymentDto extends RecordPaymentDto {
  @ApiPropertyOptional({ description: "E-mail a receipt to the invoice's bill-to address", default: false })
  @IsOptional()
  @IsBoolean({ message: 'sendReceipt is true or false.' })
  sendReceipt?: boolean;
}
