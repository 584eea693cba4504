import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  ArrayUnique,
  IsArray,
  IsInt,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
} from 'class-validator';
import { trimmedOrEmpty } from '../../stops/dto/stop-validators';

export const INVOICE_TICKETS_MAX = 100;
const DISCOUNT_BP_MESSAGE = 'A discount share is a whole number of basis points from 0 to 10000 (100 %).';
const DISCOUNT_CENTS_MESSAGE = 'A discount amount is a whole number of cents, 0 or more.';
const NOTES_MESSAGE = 'Notes are text of up to 2000 characters.';

/** The discount and notes a draft carries; both kinds of discount at once are refused by the service. */
export class InvoiceTermsDto {
  @ApiPropertyOptional({ minimum: 0, maximum: 10000, description: 'Discount as a share of the lines, basis points' })
  @IsOptional()
  @IsInt({ message: DISCOUNT_BP_MESSAGE })
  @Min(0, { message: DISCOUNT_BP_MESSAGE })
  @Max(10000, { message: DISCOUNT_BP_MESSAGE })
  discountBp?: number;

  @ApiPropertyOptional({ minimum: 0, description: 'Discount as an amount, cents (at most the lines’ sum)' })
  @IsOptional()
  @IsInt({ message: DISCOUNT_CENTS_MESSAGE })
  @Min(0, { message: DISCOUNT_CENTS_MESSAGE })
  @Max(100_000_000, { message: DISCOUNT_CENTS_MESSAGE })
  discountCents?: number;

  @ApiPropertyOptional({ maxLength: 2000, description: 'Printed on the invoice' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: NOTES_MESSAGE })
  @MaxLength(2000, { message: NOTES_MESSAGE })
  notes?: string;
}

export class CreateInvoiceDto extends InvoiceTermsDto {
  @ApiProperty({
    type: [String],
    format: 'uuid',
    minItems: 1,
    maxItems: INVOICE_TICKETS_MAX,
    description: 'Finished tickets left for an invoice, all billed to the same customer or stop',
  })
  @IsArray({ message: 'Choose the tickets to invoice.' })
  @ArrayMinSize(1, { message: 'Choose at least one ticket to invoice.' })
  @ArrayMaxSize(INVOICE_TICKETS_MAX, { message: `One invoice bills up to ${INVOICE_TICKETS_MAX} tickets.` })
  @ArrayUnique({ message: 'Name each ticket once.' })
  @IsUUID('all', { each: true, message: 'Each ticket is named by its id.' })
  ticketIds: string[];
}
