import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import { Customer } from '../customers/entities/customer.entity';
import { Shear } from '../shears/entities/shear.entity';
import { Stop } from '../stops/entities/stop.entity';

/**
 * What each role may do with stops, customers and shears, in one place (PRODUCT.md's access rules):
 * - owner and office: everything;
 * - sharpener: reads the stops assigned to them or on their route days, the customers there and their shears; edits a stop's access notes; adds photos to shears they can read;
 * - client: reads their own customer record and shears; a shop manager reads every customer and shear of their stop.
 * Something a caller may not read answers 404, as if it did not exist, so ids never confirm another client's data.
 */
export type StopAction = 'read' | 'edit' | 'edit-access-notes';
export type CustomerAction = 'read' | 'edit';
export type ShearAction = 'read' | 'edit' | 'add-photo';

const ADMIN = new Set(['owner', 'office']);

/** Stops on a sharpener's route days, any week: they need the stop's details to work it. */
const ON_MY_ROUTE_DAYS =
  'SELECT rds.stop_id FROM route_day_stops rds JOIN route_days rd ON rd.id = rds.route_day_id WHERE rd.sharpener_id = :scopeActor';

@Injectable()
export class RegistryAccess {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Narrows a stops query to what the actor may read. */
  scopeStops<T extends ObjectLiteral>(query: SelectQueryBuilder<T>, actor: Actor, alias: string) {
    if (ADMIN.has(actor.role)) return query;
    if (actor.role === 'sharpener') {
      return query.andWhere(`(${alias}.assignedSharpenerId = :scopeActor OR ${alias}.id IN (${ON_MY_ROUTE_DAYS}))`, {
        scopeActor: actor.id,
      });
    }
    return query.andWhere('false');
  }

  /** Narrows a customers query to what the actor may read. */
  scopeCustomers<T extends ObjectLiteral>(query: SelectQueryBuilder<T>, actor: Actor, alias: string) {
    if (ADMIN.has(actor.role)) return query;
    return query.andWhere(this.customerPredicate(actor, `${alias}.userId`, `${alias}.stopId`), {
      scopeActor: actor.id,
    });
  }

  /** Narrows a shears query to what the actor may read. */
  scopeShears<T extends ObjectLiteral>(query: SelectQueryBuilder<T>, actor: Actor, alias: string) {
    if (ADMIN.has(actor.role)) return query;
    return query.andWhere(
      `${alias}.customerId IN (SELECT scoped.id FROM customers scoped WHERE ${this.customerPredicate(actor, 'scoped.user_id', 'scoped.stop_id')})`,
      { scopeActor: actor.id },
    );
  }

  async requireStop(actor: Actor, id: string, action: StopAction): Promise<Stop> {
    const stop = await this.scopeStops(
      this.dataSource.getRepository(Stop).createQueryBuilder('stop').where('stop.id = :id', { id }),
      actor,
      'stop',
    ).getOne();
    if (!stop) throw notFound('The stop');
    if (ADMIN.has(actor.role) || action === 'read' || action === 'edit-access-notes') return stop;
    throw new DomainError('forbidden', 'Your role may only read this stop and edit its access notes.');
  }

  async requireCustomer(actor: Actor, id: string, action: CustomerAction): Promise<Customer> {
    const customer = await this.scopeCustomers(
      this.dataSource.getRepository(Customer).createQueryBuilder('customer').where('customer.id = :id', { id }),
      actor,
      'customer',
    ).getOne();
    if (!customer) throw notFound('The customer');
    if (ADMIN.has(actor.role) || action === 'read') return customer;
    throw new DomainError('forbidden', 'Your role may not change customer records.');
  }

  async requireShear(actor: Actor, id: string, action: ShearAction): Promise<Shear> {
    const shear = await this.scopeShears(
      this.dataSource.getRepository(Shear).createQueryBuilder('shear').where('shear.id = :id', { id }),
      actor,
      'shear',
    ).getOne();
    if (!shear) throw notFound('The shear');
    if (ADMIN.has(actor.role) || action === 'read') return shear;
    if (action === 'add-photo' && actor.role === 'sharpener') return shear;
    throw new DomainError('forbidden', 'Your role may not change this shear.');
  }

  /** SQL for "a customer this non-admin actor may read", over the given user and stop columns. */
  private customerPredicate(actor: Actor, userColumn: string, stopColumn: string): string {
    if (actor.role === 'sharpener') {
      return `(${stopColumn} IN (SELECT s.id FROM stops s WHERE s.assigned_sharpener_id = :scopeActor) OR ${stopColumn} IN (${ON_MY_ROUTE_DAYS}))`;
    }
    if (actor.role === 'client') {
      return `(${userColumn} = :scopeActor OR ${stopColumn} IN (SELECT s.id FROM stops s WHERE s.manager_user_id = :scopeActor))`;
    }
    return 'false';
  }
}
