import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { formatTagCode, normalizeTagCode, type ShearStatus } from '@keenroute/shared';
import { Repository, type EntityManager } from 'typeorm';
import { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import { Customer } from '../customers/entities/customer.entity';
import type { CreateShearDto } from './dto/create-shear.dto';
import type { ListShearsQueryDto } from './dto/list-shears-query.dto';
import { toShearDetail, type ShearDetailDto, type ShearSummaryDto } from './dto/shear-response.dto';
import type { UpdateShearDto } from './dto/update-shear.dto';
import { ShearHistoryEntry, type ShearHistoryKind } from './entities/shear-history-entry.entity';
import { ShearPhoto } from './entities/shear-photo.entity';
import { Shear } from './entities/shear.entity';
import { checkedShear, movedSummary, statusSummary } from './shear-rules';
import { todayIn } from '../stops/business-today';
import {
  fetchShearRows,
  fetchSummaries,
  filterShears,
  shearListQuery,
  shearSummaryQuery,
  sortShears,
} from './shears-query';

/** Fields a shear always has: a PATCH may leave them out, not clear them. */
const REQUIRED_ON_UPDATE = ['customerId', 'lengthIn', 'edgeType', 'toolKind', 'handedness', 'use', 'status'] as const;

@Injectable()
export class ShearsService {
  constructor(
    @InjectRepository(Shear) private readonly shears: Repository<Shear>,
    private readonly access: RegistryAccess,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  /**
   * One page of the list: the page's ids first (filters, sort, offset), then the summaries of those shears only, so
   * the per-shear counts are not computed for every shear before the sort and every row the offset skips.
   */
  async list(actor: Actor, query: ListShearsQueryDto): Promise<{ items: ShearSummaryDto[]; total: number }> {
    const matching = filterShears(this.access.scopeShears(shearListQuery(this.shears, query), actor, 'shear'), query);
    // The customer join (sorting by name) gives each shear one row, so COUNT(*) is the total without the sort that
    // TypeORM's COUNT(DISTINCT id) costs.
    const counted = await matching.clone().select('COUNT(*)::int', 'total').getRawOne<{ total: number }>();
    const total = counted?.total ?? 0;
    const page = await sortShears(matching.select('shear.id', 'id'), query)
      .offset((query.page - 1) * query.pageSize)
      .limit(query.pageSize)
      .getRawMany<{ id: string }>();
    if (page.length === 0) return { items: [], total };
    const ids = page.map((row) => row.id);
    const summaries = await fetchSummaries(shearSummaryQuery(this.shears).where('shear.id IN (:...ids)', { ids }));
    const byId = new Map(summaries.map((summary) => [summary.id, summary]));
    return { items: ids.flatMap((id) => byId.get(id) ?? []), total };
  }

  async get(actor: Actor, id: string): Promise<ShearDetailDto> {
    return this.detail((await this.access.requireShear(actor, id, 'read')).id);
  }

  /** The label's code in any form people type; another client's shear answers 404 like an unknown code. */
  async byTag(actor: Actor, tagCode: string): Promise<ShearDetailDto> {
    const code = normalizeTagCode(tagCode);
    const found = code ? await this.shears.findOne({ where: { tagCode: code }, select: { id: true } }) : null;
    if (!found) throw notFound('The shear');
    return this.get(actor, found.id);
  }

  async create(actor: Actor, dto: CreateShearDto): Promise<ShearDetailDto> {
    const customer = await this.customerFor(dto.customerId);
    const shape = checkedShear({
      edgeType: dto.edgeType,
      toolKind: dto.toolKind,
      lengthIn: dto.lengthIn,
      handedness: dto.handedness ?? 'right',
      use: dto.use ?? 'hair',
    });
    const id = await this.shears.manager.transaction(async (manager) => {
      // A sequence value is never handed out twice, even when this transaction rolls back: codes are never reused.
      const [row] = await manager.query<{ serial: string }[]>(`SELECT nextval('shear_tag_serial') AS serial`);
      const repo = manager.getRepository(Shear);
      const shear = await repo.save(
        repo.create({
          ...shape,
          tagCode: formatTagCode(Number(row!.serial)),
          customerId: customer.id,
          make: dto.make ?? '',
          model: dto.model ?? '',
          notes: dto.notes ?? '',
        }),
      );
      await this.record(manager, actor, shear.id, 'registered', `Registered to ${customer.name}`);
      return shear.id;
    });
    return this.detail(id);
  }

  async update(actor: Actor, id: string, dto: UpdateShearDto): Promise<ShearDetailDto> {
    const shear = await this.access.requireShear(actor, id, 'edit');
    refuseCleared(dto);
    const moving = dto.customerId !== undefined && dto.customerId !== shear.customerId;
    const [from, to] = moving
      ? await Promise.all([this.customerFor(shear.customerId), this.customerFor(dto.customerId!)])
      : [null, null];
    const shape = checkedShear({
      edgeType: dto.edgeType ?? shear.edgeType,
      toolKind: dto.toolKind ?? shear.toolKind,
      lengthIn: dto.lengthIn ?? shear.lengthIn,
      handedness: dto.handedness ?? shear.handedness,
      use: dto.use ?? shear.use,
    });
    const previousStatus: ShearStatus = shear.status;
    Object.assign(shear, shape, {
      customerId: to?.id ?? shear.customerId,
      make: dto.make === undefined ? shear.make : (dto.make ?? ''),
      model: dto.model === undefined ? shear.model : (dto.model ?? ''),
      notes: dto.notes === undefined ? shear.notes : (dto.notes ?? ''),
      status: dto.status ?? shear.status,
    });
    await this.shears.manager.transaction(async (manager) => {
      await manager.getRepository(Shear).save(shear);
      if (shear.status !== previousStatus) {
        await this.record(manager, actor, shear.id, 'status', statusSummary(shear.status));
      }
      if (from && to) await this.record(manager, actor, shear.id, 'moved', movedSummary(from.name, to.name));
    });
    return this.detail(shear.id);
  }

  /** The detail of a shear the caller was already allowed to read. */
  async detail(id: string): Promise<ShearDetailDto> {
    const manager = this.shears.manager;
    const [rows, photos, history] = await Promise.all([
      fetchShearRows(shearSummaryQuery(this.shears).where('shear.id = :id', { id })),
      manager.getRepository(ShearPhoto).find({ where: { shearId: id }, order: { createdAt: 'ASC', id: 'ASC' } }),
      manager
        .getRepository(ShearHistoryEntry)
        .find({ where: { shearId: id }, order: { happenedOn: 'DESC', createdAt: 'DESC', id: 'DESC' } }),
    ]);
    const row = rows[0];
    if (!row) throw notFound('The shear');
    return toShearDetail(row.shear, row.extras, photos, history);
  }

  private async customerFor(customerId: string): Promise<Customer> {
    const customer = await this.shears.manager.getRepository(Customer).findOneBy({ id: customerId });
    if (!customer) {
      const message = 'That customer does not exist. Choose the customer who owns the shear.';
      throw new DomainError('invalid_input', message, { customerId: [message] });
    }
    return customer;
  }

  private async record(manager: EntityManager, actor: Actor, shearId: string, kind: ShearHistoryKind, summary: string) {
    const happenedOn = todayIn(this.config.get('BUSINESS_TIME_ZONE', { infer: true }));
    await manager.getRepository(ShearHistoryEntry).insert({ shearId, kind, summary, happenedOn, recordedBy: actor.id });
  }
}

function refuseCleared(dto: UpdateShearDto): void {
  const cleared = REQUIRED_ON_UPDATE.filter((field) => dto[field] === null);
  if (cleared.length === 0) return;
  const fields = Object.fromEntries(
    cleared.map((field) => [field, [`${field} cannot be empty; leave it out to keep it.`]]),
  );
  throw new DomainError('invalid_input', 'Some fields need attention.', fields);
}
