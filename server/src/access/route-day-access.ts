import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import { RouteDay } from '../route-days/entities/route-day.entity';

/**
 * Who may do what with route days: owner and office plan anyone's days; a sharpener reads their own and re-orders or
 * locks stops on them; clients see none. A day the caller may not read answers 404, as if it did not exist.
 */
export type RouteDayAction = 'read' | 'reorder' | 'plan';

const ADMIN = new Set(['owner', 'office']);

@Injectable()
export class RouteDayAccess {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  isPlanner(actor: Actor): boolean {
    return ADMIN.has(actor.role);
  }

  scopeRouteDays<T extends ObjectLiteral>(query: SelectQueryBuilder<T>, actor: Actor, alias: string) {
    if (ADMIN.has(actor.role)) return query;
    if (actor.role === 'sharpener')
      return query.andWhere(`${alias}.sharpenerId = :scopeActor`, { scopeActor: actor.id });
    return query.andWhere('false');
  }

  async requireRouteDay(actor: Actor, id: string, action: RouteDayAction): Promise<RouteDay> {
    const day = await this.scopeRouteDays(
      this.dataSource.getRepository(RouteDay).createQueryBuilder('day').where('day.id = :id', { id }),
      actor,
      'day',
    ).getOne();
    if (!day) throw notFound('The route day');
    if (ADMIN.has(actor.role) || action !== 'plan') return day;
    throw new DomainError('forbidden', 'Only the owner or the office plans route days; you may re-order your own.');
  }
}
