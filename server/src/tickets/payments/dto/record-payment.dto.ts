import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Matches, Max, MaxLength, Min } from 'class-validator';
import { trimmed } from '../../../users/dto/invite-user.dto';
import { MANUAL_PAYMENT_METHODS, type ManualPaymentMethod } from '../../../payments/entities/payment.entity';

export class RecordPaymentDto {
  @ApiProperty({ enum: MANUAL_PAYMENT_METHODS, description: 'Card payments are run on a terminal and recorded here' })
  @IsIn(MANUAL_PAYMENT_METHODS, { message: 'Choose how it was paid: cash, cheque or card on a terminal.' })
  method: ManualPaymentMethod;

  @ApiProperty({ example: 4830, description: 'Integer cents, more than 0; less than the balance is a part payment' })
  @IsInt({ message: 'Enter the amount in whole cents.' })
  @Min(1, { message: 'The amount must be more than zero.' })
  @Max(10_000_000, { message: 'That amount is too large for one payment.' })
  amountCents: number;

  @ApiPropertyOptional({ example: '1042', description: 'The cheque number, or the terminal reference' })
  @IsOptional()
  @Transform(trimmed)
  @IsString()
  @MaxLength(60, { message: 'A reference has at most 60 characters.' })
  @Matches(/^[^\r\n<>]*$/, { message: 'A reference cannot contain line breaks or angle brackets.' })
  reference?: string;
}

export class SettleDto {
  @ApiProperty({ enum: ['to-invoice'], description: 'Leave what is still due for an invoice' })
  @IsIn(['to-invoice'], { message: 'A ticket can only be left for an invoice here: settlement "to-invoice".' })
  settlement: 'to-invoice';
}
