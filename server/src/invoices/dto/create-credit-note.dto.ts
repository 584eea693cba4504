import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsInt, IsString, Length, Max, Min } from 'class-validator';
import { trimmed } from '../../stops/dto/stop-validators';
import { REFUND_METHODS, type RefundMethod } from '../entities/credit-note.entity';

const AMOUNT_MESSAGE = 'A credit note is a whole number of cents, 1 or more.';
const REASON_MESSAGE = 'Say what the credit note is for (3 to 500 characters).';

export class CreateCreditNoteDto {
  @ApiProperty({ minimum: 1, description: 'Cents; at most the total less what is already credited' })
  @IsInt({ message: AMOUNT_MESSAGE })
  @Min(1, { message: AMOUNT_MESSAGE })
  @Max(100_000_000, { message: AMOUNT_MESSAGE })
  amountCents: number;

  @ApiProperty({ minLength: 3, maxLength: 500, example: 'Refund: one pair re-done for free' })
  @Transform(trimmed)
  @IsString({ message: REASON_MESSAGE })
  @Length(3, 500, { message: REASON_MESSAGE })
  reason: string;

  @ApiProperty({ enum: REFUND_METHODS, description: "How the money went back; 'none' lowers what is owed only" })
  @IsIn(REFUND_METHODS, { message: `Choose how it was refunded: ${REFUND_METHODS.join(', ')}.` })
  refundMethod: RefundMethod;
}
