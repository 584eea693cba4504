import { ApiPropertyOptional, PickType } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, IsUUID, MaxLength } from 'class-validator';
import { PageQueryDto } from '../../common/pagination.dto';
import { IsCalendarDate } from '../../stops/dto/stop-validators';
import { AUDIT_ACTIONS, type AuditAction } from '../entities/audit-entry.entity';

/** page and pageSize as every list has them; the log is newest first, filtered by kind, who, what and when. */
export class ListAuditQueryDto extends PickType(PageQueryDto, ['page', 'pageSize'] as const) {
  @ApiPropertyOptional({ enum: AUDIT_ACTIONS })
  @IsOptional()
  @IsIn(AUDIT_ACTIONS, { message: `action is one of: ${AUDIT_ACTIONS.join(', ')}.` })
  action?: AuditAction;

  @ApiPropertyOptional({ format: 'uuid', description: 'Only what this user did' })
  @IsOptional()
  @IsUUID('all', { message: 'actorId must be a user id.' })
  actorId?: string;

  @ApiPropertyOptional({ description: "Part of the actor's e-mail (for failed sign-ins, the e-mail typed)" })
  @IsOptional()
  @IsString({ message: 'actor is part of an e-mail address, up to 254 characters.' })
  @MaxLength(254, { message: 'actor is part of an e-mail address, up to 254 characters.' })
  actor?: string;

  @ApiPropertyOptional({ format: 'uuid', description: 'Only entries about this user, ticket or invoice' })
  @IsOptional()
  @IsUUID('all', { message: 'subjectId must be an id.' })
  subjectId?: string;

  @ApiPropertyOptional({ example: '2026-01-01', description: 'First day included, in the business time zone' })
  @IsOptional()
  @IsCalendarDate({ message: 'from is a date like 2026-01-01.' })
  from?: string;

  @ApiPropertyOptional({ example: '2026-12-31', description: 'Last day included, in the business time zone' })
  @IsOptional()
  @IsCalendarDate({ message: 'to is a date like 2026-12-31.' })
  to?: string;
}
