import { ApiProperty } from '@nestjs/swagger';
import type { Customer } from '../entities/customer.entity';
import { RefDto } from './ref.dto';

export class CustomerSummaryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) email: string | null;
  @ApiProperty({ nullable: true, type: String }) phone: string | null;
  @ApiProperty({ nullable: true, type: RefDto, description: 'null for a mail-in customer' }) stop: RefDto | null;
  @ApiProperty() shearCount: number;
  @ApiProperty() visitNoticeConsent: boolean;
  @ApiProperty() active: boolean;
  @ApiProperty({ description: 'They have a client account' }) hasAccount: boolean;
}

export class CustomerAccountDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() email: string;
}

export class CustomerStopStretchDto {
  @ApiProperty({ type: RefDto }) stop: RefDto;
  @ApiProperty() startedAt: string;
  @ApiProperty({ nullable: true, type: String, description: 'null: they work there now' }) endedAt: string | null;
}

export class CustomerDetailDto extends CustomerSummaryDto {
  @ApiProperty() notes: string;
  @ApiProperty({ nullable: true, type: CustomerAccountDto }) user: CustomerAccountDto | null;
  @ApiProperty({ type: [CustomerStopStretchDto], description: 'Newest first' }) stopHistory: CustomerStopStretchDto[];
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export class CustomerListDto {
  @ApiProperty({ type: [CustomerSummaryDto] }) items: CustomerSummaryDto[];
  @ApiProperty() total: number;
}

export const toCustomerSummary = (customer: Customer, stop: RefDto | null, shearCount: number): CustomerSummaryDto => ({
  id: customer.id,
  name: customer.name,
  email: customer.email,
  phone: customer.phone,
  stop,
  shearCount,
  visitNoticeConsent: customer.visitNoticeConsent,
  active: customer.active,
  hasAccount: customer.userId !== null,
});

export const toCustomerDetail = (
  customer: Customer,
  extra: {
    stop: RefDto | null;
    shearCount: number;
    user: CustomerAccountDto | null;
    stopHistory: CustomerStopStretchDto[];
  },
): CustomerDetailDto => ({
  ...toCustomerSummary(customer, extra.stop, extra.shearCount),
  notes: customer.notes,
  user: extra.user,
  stopHistory: extra.stopHistory,
  createdAt: customer.createdAt.toISOString(),
  updatedAt: customer.updatedAt.toISOString(),
});
