import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsString, IsUUID, Max, MaxLength, Min } from 'class-validator';
import { BILL_TO, INVOICE_STATUSES, type BillTo, type InvoiceStatus } from '../entities/invoice.entity';

const flag = ({ value }: { value: unknown }): unknown => (value === 'true' ? true : value === 'false' ? false : value);

export class ListInvoicesQueryDto {
  @ApiPropertyOptional({ enum: INVOICE_STATUSES })
  @IsOptional()
  @IsIn(INVOICE_STATUSES, { message: `Choose a status: ${INVOICE_STATUSES.join(', ')}.` })
  status?: InvoiceStatus;

  @ApiPropertyOptional({ description: 'Only issued invoices past their due date with something owed' })
  @IsOptional()
  @Transform(flag)
  @IsBoolean({ message: 'overdue is true or false.' })
  overdue?: boolean;

  @ApiPropertyOptional({ enum: BILL_TO })
  @IsOptional()
  @IsIn(BILL_TO, { message: `billTo is one of: ${BILL_TO.join(', ')}.` })
  billTo?: BillTo;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'customerId must be a customer id.' })
  customerId?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'stopId must be a stop id.' })
  stopId?: string;

  @ApiPropertyOptional({ description: 'Number or bill-to name' })
  @IsOptional()
  @IsString({ message: 'Search text is up to 100 characters.' })
  @MaxLength(100, { message: 'Search text is up to 100 characters.' })
  q?: string;

  @ApiPropertyOptional({ default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'page is a whole number from 1.' })
  @Min(1, { message: 'page is a whole number from 1.' })
  page = 1;

  @ApiPropertyOptional({ default: 25, maximum: 100 })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'pageSize is a whole number from 1 to 100.' })
  @Min(1, { message: 'pageSize is a whole number from 1 to 100.' })
  @Max(100, { message: 'pageSize is a whole number from 1 to 100.' })
  pageSize = 25;
}
