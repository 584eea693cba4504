import { ApiProperty } from '@nestjs/swagger';
import {
  AUDIT_ACTIONS,
  AUDIT_SUBJECTS,
  type AuditAction,
  type AuditDetail,
  type AuditEntry,
  type AuditSubject,
} from '../entities/audit-entry.entity';

export class AuditEntryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'date-time' }) at: string;
  @ApiProperty({ format: 'uuid', nullable: true, type: String }) actorId: string | null;
  @ApiProperty({ nullable: true, type: String }) actorEmail: string | null;
  @ApiProperty({ enum: AUDIT_ACTIONS }) action: AuditAction;
  @ApiProperty({ enum: AUDIT_SUBJECTS }) subjectType: AuditSubject;
  @ApiProperty({ format: 'uuid', nullable: true, type: String }) subjectId: string | null;
  @ApiProperty({ type: 'object', additionalProperties: true, example: { fromCents: 4200, toCents: 3000 } })
  detail: AuditDetail;
  @ApiProperty({ nullable: true, type: String }) ip: string | null;
}

export class AuditListDto {
  @ApiProperty({ type: [AuditEntryDto] }) items: AuditEntryDto[];
  @ApiProperty() total: number;
  @ApiProperty() page: number;
  @ApiProperty() pageSize: number;
}

export const toAuditEntryDto = (entry: AuditEntry): AuditEntryDto => ({
  id: entry.id,
  at: entry.at.toISOString(),
  actorId: entry.actorId,
  actorEmail: entry.actorEmail,
  action: entry.action,
  subjectType: entry.subjectType,
  subjectId: entry.subjectId,
  detail: entry.detail,
  ip: entry.ip,
});
