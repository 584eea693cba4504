import { ApiPropertyOptional, PickType } from '@nestjs/swagger';
import { PageQueryDto } from '../../common/pagination.dto';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsUUID } from 'class-validator';
import { BILL_TO, INVOICE_STATUSES, type BillTo, type InvoiceStatus } from '../entities/invoice.entity';

const flag = ({ value }: { value: unknown }): unknown => (value === 'true' ? true : value === 'false' ? false : value);

/** page, pageSize and q (number or bill-to name) as every list has them, plus the invoice filters. */
export class ListInvoicesQueryDto extends PickType(PageQueryDto, ['page', 'pageSize', 'q'] as const) {
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
}
