import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { notFound } from '../common/errors/domain-error';
import { likePattern } from '../common/pagination.dto';
import { PlanningSettings } from '../route-days/entities/planning-settings.entity';
import { Stop } from '../stops/entities/stop.entity';
import { BookingDays } from './booking-days';
import type { PublicStopDto, PublicStopListDto } from './dto/booking-response.dto';

/** Route days a stop's public page lists. */
const NEXT_DAYS = 4;
const SEARCH_MAX = 20;

/** What the signed-out booking page may know of stops: name, town, street and the next route days. */
@Injectable()
export class PublicStopsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly days: BookingDays,
  ) {}

  async search(q?: string): Promise<PublicStopListDto> {
    const query = this.publicStops().orderBy('s.name').addOrderBy('s.id').take(SEARCH_MAX);
    if (q) query.andWhere('(s.name ILIKE :q OR s.city ILIKE :q)', { q: likePattern(q) });
    const stops = await query.getMany();
    const upcoming = await this.days.upcoming(stops.map((s) => s.id));
    return {
      items: stops.map((s) => ({
        id: s.id,
        name: s.name,
        city: s.city,
        nextDays: (upcoming.get(s.id) ?? []).slice(0, NEXT_DAYS),
      })),
    };
  }

  async get(id: string): Promise<PublicStopDto> {
    const stop = await this.publicStops().andWhere('s.id = :id', { id }).getOne();
    if (!stop) throw notFound('The stop');
    const upcoming = await this.days.upcoming([stop.id]);
    const base = await this.dataSource.getRepository(PlanningSettings).findOneBy({ id: 1 });
    return {
      id: stop.id,
      name: stop.name,
      street: stop.street,
      city: stop.city,
      nextDays: (upcoming.get(stop.id) ?? []).slice(0, NEXT_DAYS),
      mailIn: { address: base?.baseLabel ?? 'Ask the office for the mail-in address.' },
    };
  }

  /** Active stops with coordinates: the ones a route day can reach. */
  private publicStops() {
    return this.dataSource
      .getRepository(Stop)
      .createQueryBuilder('s')
      .where('s.active')
      .andWhere('s.latitude IS NOT NULL AND s.longitude IS NOT NULL');
  }
}
