import { ApiProperty } from '@nestjs/swagger';
import { VISIT_NOTICE_STATUSES, type VisitNoticeStatus } from '../../entities/visit-notice.entity';
import type { NoticeRow } from '../visit-notices.service';

export class VisitNoticeDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) stopId: string;
  @ApiProperty() stopName: string;
  @ApiProperty({ example: '2026-12-08' }) day: string;
  @ApiProperty({ example: 'front-desk@salon.example.test' }) recipient: string;
  @ApiProperty({ format: 'uuid', nullable: true, type: String, description: "Null for the stop's own address" })
  customerId: string | null;
  @ApiProperty({ enum: VISIT_NOTICE_STATUSES }) status: VisitNoticeStatus;
  @ApiProperty({ description: 'E-mails tried so far' }) attempts: number;
  @ApiProperty({ nullable: true, type: String }) lastError: string | null;
  @ApiProperty({ nullable: true, type: String, format: 'date-time' }) sentAt: string | null;
}

export class VisitNoticeListDto {
  @ApiProperty({ type: [VisitNoticeDto] }) items: VisitNoticeDto[];
}

export const toVisitNotice = (row: NoticeRow): VisitNoticeDto => ({
  id: row.id,
  stopId: row.stopId,
  stopName: row.stopName,
  day: row.day,
  recipient: row.recipient,
  customerId: row.customerId,
  status: row.status,
  attempts: row.attempts,
  lastError: row.lastError,
  sentAt: row.sentAt ? row.sentAt.toISOString() : null,
});
