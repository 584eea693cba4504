import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { addDays, daysOverdue, nextDueDate, weekStart } from '@keenroute/shared';
import { Repository, type SelectQueryBuilder } from 'typeorm';
import { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import { likePattern } from '../common/pagination.dto';
import { User } from '../users/entities/user.entity';
import type { ComingDueQueryDto } from './dto/coming-due-query.dto';
import type { ListStopsQueryDto, StopSort } from './dto/list-stops-query.dto';
import type { StopRow } from './dto/stop-response.dto';
import { Stop } from './entities/stop.entity';

// The last worked visit, and the SQL twin of nextDueDate() so sorting, filtering and paging stay in the database.
const LAST_VISIT = '(SELECT max(visit.worked_on) FROM stop_visits visit WHERE visit.stop_id = stop.id)';
const NEXT_DUE = `COALESCE(${LAST_VISIT} + stop.cadenceWeeks * 7, CAST(:today AS date))`;
const CUSTOMER_COUNT = '(SELECT count(*)::int FROM customers c WHERE c.stop_id = stop.id AND c.active)';
// The exact expressions of the trigram indexes in the registry migration, so ILIKE can use them.
const SEARCH = "(stop.name ILIKE :q OR (stop.street || ' ' || stop.city || ' ' || stop.postalCode) ILIKE :q)";

const SORT_COLUMNS: Record<StopSort, string> = {
  name: 'stop.name',
  city: 'stop.city',
  kind: 'stop.kind',
  nextDueOn: 'next_due_on',
  createdAt: 'stop.createdAt',
};

interface RawStop {
  stop_id: string;
  last_visit_on: string | null;
  customer_count: number;
  sharpener_name: string | null;
  manager_name: string | null;
}

/** Reads stops with what is derived from their visits, customers and people. */
@Injectable()
export class StopListing {
  constructor(
    @InjectRepository(Stop) private readonly stops: Repository<Stop>,
    private readonly access: RegistryAccess,
  ) {}

  async list(actor: Actor, query: ListStopsQueryDto, today: string): Promise<{ items: StopRow[]; total: number }> {
    const builder = this.access.scopeStops(this.base(today), actor, 'stop');
    if (query.q) builder.andWhere(SEARCH, { q: likePattern(query.q) });
    if (query.kind) builder.andWhere('stop.kind = :kind', { kind: query.kind });
    if (query.sharpenerId)
      builder.andWhere('stop.assignedSharpenerId = :sharpenerId', { sharpenerId: query.sharpenerId });
    if (query.active !== undefined) builder.andWhere('stop.active = :active', { active: query.active });
    const direction = query.order === 'desc' ? 'DESC' : 'ASC';
    builder.orderBy(SORT_COLUMNS[query.sort], direction);
    if (query.sort === 'nextDueOn') builder.addOrderBy('stop.name', 'ASC');
    builder.addOrderBy('stop.id', 'ASC');
    return this.page(builder, query, today);
  }

  /** Active stops due on or before the Sunday of the week asked for, soonest (most overdue) first. */
  async comingDue(actor: Actor, query: ComingDueQueryDto, today: string): Promise<{ items: StopRow[]; total: number }> {
    const weekEnd = addDays(weekStart(query.week ?? today), 6);
    const builder = this.access
      .scopeStops(this.base(today), actor, 'stop')
      .andWhere('stop.active')
      .andWhere(`${NEXT_DUE} <= CAST(:weekEnd AS date)`, { weekEnd });
    if (query.sharpenerId)
      builder.andWhere('stop.assignedSharpenerId = :sharpenerId', { sharpenerId: query.sharpenerId });
    builder.orderBy('next_due_on', 'ASC').addOrderBy('stop.name', 'ASC').addOrderBy('stop.id', 'ASC');
    return this.page(builder, query, today);
  }

  async byId(id: string, today: string): Promise<StopRow | undefined> {
    const [row] = await this.rows(this.base(today).where('stop.id = :id', { id }), today);
    return row;
  }

  private base(today: string): SelectQueryBuilder<Stop> {
    return this.stops
      .createQueryBuilder('stop')
      .leftJoin(User, 'sharpener', 'sharpener.id = stop.assignedSharpenerId')
      .leftJoin(User, 'manager', 'manager.id = stop.managerUserId')
      .addSelect(`${LAST_VISIT}::text`, 'last_visit_on')
      .addSelect(`${NEXT_DUE}`, 'next_due_on')
      .addSelect(CUSTOMER_COUNT, 'customer_count')
      .addSelect('sharpener.name', 'sharpener_name')
      .addSelect('manager.name', 'manager_name')
      .setParameter('today', today);
  }

  private async page(
    builder: SelectQueryBuilder<Stop>,
    query: { page: number; pageSize: number },
    today: string,
  ): Promise<{ items: StopRow[]; total: number }> {
    const total = await builder.getCount();
    // Only many-to-one joins: one row per stop, so plain OFFSET/LIMIT pages correctly.
    builder.offset((query.page - 1) * query.pageSize).limit(query.pageSize);
    return { items: await this.rows(builder, today), total };
  }

  private async rows(builder: SelectQueryBuilder<Stop>, today: string): Promise<StopRow[]> {
    const { entities, raw } = await builder.getRawAndEntities<RawStop>();
    const derived = new Map(raw.map((row) => [row.stop_id, row]));
    return entities.map((stop) => {
      const extra = derived.get(stop.id);
      const lastVisitOn = extra?.last_visit_on ?? null;
      const nextDueOn = nextDueDate(lastVisitOn, stop.cadenceWeeks, today);
      return {
        stop,
        lastVisitOn,
        nextDueOn,
        daysOverdue: daysOverdue(nextDueOn, today),
        customerCount: extra?.customer_count ?? 0,
        sharpener: stop.assignedSharpenerId
          ? { id: stop.assignedSharpenerId, name: extra?.sharpener_name ?? '' }
          : null,
        manager: stop.managerUserId ? { id: stop.managerUserId, name: extra?.manager_name ?? '' } : null,
      };
    });
  }
}
