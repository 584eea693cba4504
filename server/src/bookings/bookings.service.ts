import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, SelectQueryBuilder } from 'typeorm';
import type { Actor } from '../auth/actor';
import { notFound } from '../common/errors/domain-error';
import { BookingViews } from './booking-views';
import type { BookingQueryDto } from './dto/booking-query.dto';
import type { BookingDto, BookingListDto } from './dto/booking-response.dto';
import { Booking } from './entities/booking.entity';

/** Most bookings one list answer carries; a day or a stop has far fewer. */
const LIST_MAX = 500;

/**
 * Bookings as staff and clients see them: owner and office all; a sharpener those on their own route days; a client
 * their own (booked as their customer record or with their account's e-mail). Others' bookings answer 404.
 */
@Injectable()
export class BookingsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly views: BookingViews,
  ) {}

  async list(actor: Actor, query: BookingQueryDto): Promise<BookingListDto> {
    const builder = this.scoped(actor)
      .leftJoinAndSelect('b.items', 'item')
      .orderBy('b.day', 'ASC', 'NULLS LAST')
      .addOrderBy('b.createdAt', 'ASC')
      .addOrderBy('item.position', 'ASC');
    if (query.day) builder.andWhere('b.day = :day', { day: query.day });
    if (query.stopId) builder.andWhere('b.stopId = :stopId', { stopId: query.stopId });
    if (query.routeDayId) builder.andWhere('b.routeDayId = :routeDayId', { routeDayId: query.routeDayId });
    if (query.status) builder.andWhere('b.status = :status', { status: query.status });
    const [rows, total] = await builder.take(LIST_MAX).getManyAndCount();
    return { items: await this.views.many(rows), total };
  }

  async get(actor: Actor, id: string): Promise<BookingDto> {
    const found = await this.scoped(actor).andWhere('b.id = :id', { id }).getOne();
    if (!found) throw notFound('The booking');
    return this.views.one(found.id);
  }

  private scoped(actor: Actor): SelectQueryBuilder<Booking> {
    const query = this.dataSource.getRepository(Booking).createQueryBuilder('b').where('true');
    switch (actor.role) {
      case 'owner':
      case 'office':
        return query;
      case 'sharpener':
        return query.andWhere('b.routeDayId IN (SELECT rd.id FROM route_days rd WHERE rd.sharpener_id = :scopeActor)', {
          scopeActor: actor.id,
        });
      case 'client':
        return query.andWhere(
          '(b.customerId IN (SELECT c.id FROM customers c WHERE c.user_id = :scopeActor) OR lower(b.email) = lower(:scopeEmail))',
          { scopeActor: actor.id, scopeEmail: actor.email },
        );
      default: {
        const unhandled: never = actor.role;
        throw new Error(`No booking scope for role ${String(unhandled)}`);
      }
    }
  }
}
