import { ApiProperty } from '@nestjs/swagger';
import { PAYMENT_METHODS, type Payment, type PaymentMethod } from '../../../payments/entities/payment.entity';

export class PaymentDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: PAYMENT_METHODS }) method: PaymentMethod;
  @ApiProperty() amountCents: number;
  @ApiProperty({ description: 'Cheque number or terminal reference; empty for cash' }) reference: string;
  @ApiProperty() recordedAt: string;
}

export const toPaymentDto = (payment: Payment): PaymentDto => ({
  id: payment.id,
  method: payment.method,
  amountCents: payment.amountCents,
  reference: payment.reference,
  recordedAt: payment.recordedAt.toISOString(),
});
