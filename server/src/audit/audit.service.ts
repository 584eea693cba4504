import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import type { EntityManager, Repository } from 'typeorm';
import { likePattern } from '../common/pagination.dto';
import { DomainError } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import type { ListAuditQueryDto } from './dto/list-audit-query.dto';
import { AuditEntry, type AuditAction, type AuditDetail, type AuditSubject } from './entities/audit-entry.entity';
import { requestIp } from './request-context';

const EMAIL_LENGTH = 254;

export interface AuditRecord {
  action: AuditAction;
  /** A signed-in actor, an e-mail alone (a failed sign-in), or null (the payment service's webhook). */
  actor: { id: string | null; email: string | null } | null;
  subject: { type: AuditSubject; id: string | null };
  detail?: AuditDetail;
}

/** Writes the audit log for the other services and reads it for the owner. */
@Injectable()
export class AuditService {
  private readonly timeZone: string;

  constructor(
    @InjectRepository(AuditEntry) private readonly entries: Repository<AuditEntry>,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  /**
   * Adds one entry. Pass the transaction's manager wherever the change runs in one: the entry then commits or rolls
   * back with it, so the log never shows a change that did not happen, nor misses one that did.
   */
  async record(entry: AuditRecord, manager?: EntityManager): Promise<void> {
    const repository = manager ? manager.getRepository(AuditEntry) : this.entries;
    await repository.insert({
      actorId: entry.actor?.id ?? null,
      actorEmail: entry.actor?.email?.trim().toLowerCase().slice(0, EMAIL_LENGTH) ?? null,
      action: entry.action,
      subjectType: entry.subject.type,
      subjectId: entry.subject.id,
      detail: entry.detail ?? {},
      ip: requestIp(),
    });
  }

  async list(query: ListAuditQueryDto): Promise<{ items: AuditEntry[]; total: number }> {
    if (query.from && query.to && query.from > query.to) {
      throw new DomainError('invalid_input', `The range starts (${query.from}) after it ends (${query.to}).`, {
        from: ['from must be on or before to.'],
      });
    }
    const builder = this.entries.createQueryBuilder('entry');
    if (query.action) builder.andWhere('entry.action = :action', { action: query.action });
    if (query.actorId) builder.andWhere('entry.actorId = :actorId', { actorId: query.actorId });
    if (query.actor) builder.andWhere('entry.actorEmail ILIKE :actor', { actor: likePattern(query.actor) });
    if (query.subjectId) builder.andWhere('entry.subjectId = :subjectId', { subjectId: query.subjectId });
    // Whole days in the business's time zone, both ends included, as the reports count them.
    if (query.from) {
      builder.andWhere('entry.at >= (CAST(:from AS date)::timestamp AT TIME ZONE :tz)', {
        from: query.from,
        tz: this.timeZone,
      });
    }
    if (query.to) {
      builder.andWhere('entry.at < ((CAST(:to AS date) + 1)::timestamp AT TIME ZONE :tz)', {
        to: query.to,
        tz: this.timeZone,
      });
    }
    const [items, total] = await builder
      .orderBy('entry.at', 'DESC')
      .addOrderBy('entry.id', 'DESC')
      .skip((query.page - 1) * query.pageSize)
      .take(query.pageSize)
      .getManyAndCount();
    return { items, total };
  }
}
