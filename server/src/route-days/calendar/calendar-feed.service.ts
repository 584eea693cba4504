import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { addDays } from '@keenroute/shared';
import { randomBytes } from 'node:crypto';
import { Between, In, Repository } from 'typeorm';
import type { Actor } from '../../auth/actor';
import { notFound } from '../../common/errors/domain-error';
import type { AppConfig } from '../../config/environment';
import { todayIn } from '../../stops/business-today';
import { Stop } from '../../stops/entities/stop.entity';
import { User } from '../../users/entities/user.entity';
import { CalendarFeed } from '../entities/calendar-feed.entity';
import { RouteDayStop } from '../entities/route-day-stop.entity';
import { RouteDay } from '../entities/route-day.entity';
import { routeDayCalendar, type CalendarRouteDay, type CalendarStop } from './route-day-calendar';
import { zonedInstant } from './vtimezone';

/** How far the feed reaches: a fortnight back for the record, about three months ahead for planning. */
export const FEED_DAYS_BACK = 14;
export const FEED_DAYS_AHEAD = 90;

/** 32 random bytes, base64url: 43 characters. */
const TOKEN = /^[A-Za-z0-9_-]{43}$/;
const newToken = () => randomBytes(32).toString('base64url');

/**
 * A secret feed address per person. The token is kept as it is (not hashed) because the address is shown again on
 * every visit to the settings page; it only reads that person's own route days, and renewing it retires the old one.
 */
@Injectable()
export class CalendarFeedService {
  private readonly appUrl: string;
  private readonly timeZone: string;

  constructor(
    @InjectRepository(CalendarFeed) private readonly feeds: Repository<CalendarFeed>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(RouteDay) private readonly routeDays: Repository<RouteDay>,
    @InjectRepository(RouteDayStop) private readonly routeDayStops: Repository<RouteDayStop>,
    @InjectRepository(Stop) private readonly stops: Repository<Stop>,
    config: ConfigService<AppConfig, true>,
  ) {
    this.appUrl = config.get('APP_URL', { infer: true }).replace(/\/+$/, '');
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  /** The caller's feed address, made on the first call (two first calls at once share one token). */
  async feedUrl(actor: Actor): Promise<string> {
    await this.feeds
      .createQueryBuilder()
      .insert()
      .into(CalendarFeed)
      .values({ userId: actor.id, token: newToken() })
      .orIgnore()
      .execute();
    const feed = await this.feeds.findOneByOrFail({ userId: actor.id });
    return this.urlFor(feed.token);
  }

  /** A new address; the old one answers 404 from now on. */
  async renew(actor: Actor): Promise<string> {
    const token = newToken();
    await this.feeds.upsert({ userId: actor.id, token, createdAt: new Date() }, ['userId']);
    return this.urlFor(token);
  }

  /** The iCalendar text behind a feed token, or not_found for an unknown token or a deactivated person. */
  async calendar(token: string, today: string = todayIn(this.timeZone)): Promise<string> {
    const feed = TOKEN.test(token) ? await this.feeds.findOneBy({ token }) : null;
    const user = feed ? await this.users.findOneBy({ id: feed.userId, active: true }) : null;
    if (!user) throw notFound('Calendar feed');
    const first = addDays(today, -FEED_DAYS_BACK);
    const last = addDays(today, FEED_DAYS_AHEAD);
    return routeDayCalendar({
      sharpenerName: user.name,
      timeZone: this.timeZone,
      from: zonedInstant(this.timeZone, addDays(first, -1), 0),
      to: zonedInstant(this.timeZone, addDays(last, 2), 0),
      days: await this.routeDaysOf(user.id, first, last),
    });
  }

  private urlFor(token: string): string {
    return `${this.appUrl}/api/calendar/${token}.ics`;
  }

  private async routeDaysOf(sharpenerId: string, first: string, last: string): Promise<CalendarRouteDay[]> {
    const days = await this.routeDays.find({
      where: { sharpenerId, day: Between(first, last) },
      order: { day: 'ASC' },
    });
    if (days.length === 0) return [];
    const planned = await this.routeDayStops.find({
      where: { routeDayId: In(days.map((d) => d.id)) },
      order: { position: 'ASC' },
    });
    const stopIds = [...new Set(planned.map((p) => p.stopId))];
    const stops = new Map(
      (stopIds.length > 0 ? await this.stops.findBy({ id: In(stopIds) }) : []).map((s) => [s.id, s]),
    );
    return days.map((day) => ({
      id: day.id,
      day: day.day,
      departure: day.departure,
      finish: day.finish,
      distanceKm: day.distanceKm,
      version: day.version,
      stops: planned
        .filter((p) => p.routeDayId === day.id && stops.has(p.stopId))
        .map((p): CalendarStop => {
          const stop = stops.get(p.stopId)!;
          return {
            stopId: stop.id,
            name: stop.name,
            street: stop.street,
            city: stop.city,
            arrival: p.arrival,
            leave: p.leave,
            accessParking: stop.accessParking,
            accessDoor: stop.accessDoor,
            accessBestTime: stop.accessBestTime,
          };
        }),
    }));
  }
}
