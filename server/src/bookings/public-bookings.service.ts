import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  bookedBenchMinutes,
  bookingCutoff,
  formatTimeOfDay,
  type BookingItem as Item,
  type EdgeType,
  type ToolKind,
} from '@keenroute/shared';
import { createHmac } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { Actor } from '../auth/actor';
import { hashSecret } from '../auth/token-hash';
import { DomainError } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import { MailOutbox } from '../mail/mail-outbox';
import { RatesService } from '../rates/rates.service';
import { longDayLabel } from '../route-days/notices/visit-notice-mail';
import { Stop } from '../stops/entities/stop.entity';
import { BookingDays } from './booking-days';
import { estimateBooking } from './booking-estimate';
import { bookingConfirmationMail, manageUrl } from './booking-mail';
import { BookingViews, toPublicBooking } from './booking-views';
import { DayFullError } from './day-full.error';
import type {
  BookingItemDto,
  BookingLineDto,
  ChangeBookingDto,
  CreateBookingDto,
  QuoteBookingDto,
} from './dto/booking-input.dto';
import type { BookingQuoteDto, CreatedBookingDto, PublicBookingDto, PublicDayDto } from './dto/booking-response.dto';
import { BookingItem } from './entities/booking-item.entity';
import { Booking } from './entities/booking.entity';

const NEEDS_ATTENTION = 'Some fields need attention.';
const TOKEN = /^[A-Za-z0-9_-]{43}$/;

/** The public side of drop-offs: quote, book, and read, change or cancel through the private link. */
@Injectable()
export class PublicBookingsService {
  private readonly appUrl: string;
  private readonly linkKey: Buffer;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly days: BookingDays,
    private readonly views: BookingViews,
    private readonly rates: RatesService,
    private readonly mail: MailOutbox,
    config: ConfigService<AppConfig, true>,
  ) {
    this.appUrl = config.get('APP_URL', { infer: true });
    // A key of its own for booking links, derived from the server secret (common practice: one purpose per key).
    this.linkKey = createHmac('sha256', config.get('JWT_SECRET', { infer: true }))
      .update('keenroute booking links')
      .digest();
  }

  async quote(dto: QuoteBookingDto): Promise<BookingQuoteDto> {
    const stop = await this.requireStop(dto.stopId);
    const current = await this.rates.current();
    if (!current)
      throw new DomainError('conflict', 'Prices are not published yet: book now and the price is set at the bench.');
    return estimateBooking(toItems(dto.items), current.card, stop.taxRateBp);
  }

  async create(
    dto: CreateBookingDto,
    actor: Actor | null = null,
  ): Promise<{ result: CreatedBookingDto; created: boolean }> {
    // The honeypot: people never see the field, form-filling robots fill it in. Nothing is written.
    if (dto.website)
      throw new DomainError('invalid_input', 'This form could not be sent. Reload the page and try again.');
    const earlier = await this.dataSource.getRepository(Booking).findOneBy({ idempotencyKey: dto.idempotencyKey });
    if (earlier) return this.replay(earlier);

    const stop = await this.requireStop(dto.stopId);
    if (dto.mailIn && dto.routeDayId) {
      throw new DomainError('invalid_input', NEEDS_ATTENTION, { routeDayId: ['A mail-in has no route day.'] });
    }
    if (!dto.mailIn && !dto.routeDayId) {
      throw new DomainError('invalid_input', NEEDS_ATTENTION, { routeDayId: ['Choose a route day, or mail-in.'] });
    }
    const { items, customerId: ownerOfShears } = await this.resolveLines(dto.items, actor);
    const benchMinutes = bookedBenchMinutes(items);
    const estimateCents = await this.estimateCents(items, stop.taxRateBp);
    const token = this.tokenFor(dto.idempotencyKey);

    let outcome: { id: string; created: boolean };
    try {
      outcome = await this.dataSource.transaction(async (manager) => {
        let day: PublicDayDto | null = null;
        if (dto.routeDayId) {
          day = await this.requireRoom(manager, dto.routeDayId, stop.id, benchMinutes, null);
          // A twin request that waited on the lock finds the booking its first copy made.
          const twin = await manager.getRepository(Booking).findOneBy({ idempotencyKey: dto.idempotencyKey });
          if (twin) return { id: twin.id, created: false };
        }
        const saved = await manager.getRepository(Booking).save(
          manager.create(Booking, {
            stopId: stop.id,
            routeDayId: day?.routeDayId ?? null,
            day: day?.day ?? null,
            mailIn: dto.mailIn,
            status: 'booked',
            name: dto.name,
            email: dto.email,
            phone: dto.phone,
            notes: dto.notes ?? '',
            consent: dto.consent,
            customerId: ownerOfShears ?? (await this.matchCustomer(manager, stop.id, dto.email)),
            manageTokenHash: hashSecret(token),
            idempotencyKey: dto.idempotencyKey,
            benchMinutes,
            estimateCents,
            ticketId: null,
            cancelledAt: null,
            items: items.map((row) => ({ ...row })),
          }),
        );
        return { id: saved.id, created: true };
      });
    } catch (error) {
      if (!isDuplicateKey(error)) throw error;
      const twin = await this.dataSource.getRepository(Booking).findOneBy({ idempotencyKey: dto.idempotencyKey });
      if (!twin) throw error;
      return this.replay(twin);
    }
    const view = toPublicBooking(await this.views.one(outcome.id));
    const link = manageUrl(this.appUrl, token);
    if (outcome.created) {
      const mail = bookingConfirmationMail(view, link, await this.currency());
      await this.mail.queue({
        ...mail,
        key: `booking-confirmation:${outcome.id}`,
        topic: 'booking',
        refId: outcome.id,
      });
    }
    return { result: { booking: view, manageUrl: link }, created: outcome.created };
  }

  async read(token: string): Promise<PublicBookingDto> {
    return toPublicBooking(await this.views.one((await this.byToken(token)).id));
  }

  async change(token: string, dto: ChangeBookingDto): Promise<PublicBookingDto> {
    const { id } = await this.byToken(token);
    await this.dataSource.transaction(async (manager) => {
      const booking = await this.lockBooking(manager, id);
      await this.requireChangeable(manager, booking);
      if (booking.mailIn && dto.routeDayId) {
        throw new DomainError('invalid_input', NEEDS_ATTENTION, {
          routeDayId: ['A mail-in has no route day: cancel it and book a day instead.'],
        });
      }
      const items = dto.items ? toItems(dto.items) : booking.items.sort((a, b) => a.position - b.position);
      const benchMinutes = bookedBenchMinutes(items);
      const target = dto.routeDayId ?? booking.routeDayId;
      if (target) {
        const day = await this.requireRoom(manager, target, booking.stopId, benchMinutes, booking.id);
        booking.routeDayId = day.routeDayId;
        booking.day = day.day;
      }
      if (dto.items) {
        const stop = await manager.getRepository(Stop).findOneByOrFail({ id: booking.stopId });
        booking.estimateCents = await this.estimateCents(items, stop.taxRateBp);
        await manager.delete(BookingItem, { bookingId: booking.id });
        await manager.save(
          itemRows(items).map((row) => manager.create(BookingItem, { ...row, bookingId: booking.id })),
        );
      }
      await manager.getRepository(Booking).update(booking.id, {
        routeDayId: booking.routeDayId,
        day: booking.day,
        benchMinutes,
        estimateCents: booking.estimateCents,
        notes: dto.notes ?? booking.notes,
        phone: dto.phone ?? booking.phone,
      });
    });
    return this.read(token);
  }

  async cancel(token: string): Promise<PublicBookingDto> {
    const { id } = await this.byToken(token);
    await this.dataSource.transaction(async (manager) => {
      const booking = await this.lockBooking(manager, id);
      if (booking.status === 'cancelled') return;
      await this.requireChangeable(manager, booking);
      await manager.getRepository(Booking).update(booking.id, { status: 'cancelled', cancelledAt: new Date() });
    });
    return this.read(token);
  }

  /** Kinds as given; a signed-in client's own shears by id, each read from the registry and counted once. */
  private async resolveLines(
    lines: readonly BookingLineDto[],
    actor: Actor | null,
  ): Promise<{ items: ItemRow[]; customerId: string | null }> {
    const shearIds = lines.flatMap((line) => (line.shearId ? [line.shearId] : []));
    if (shearIds.length === 0) return { items: itemRows(toItems(lines as BookingItemDto[])), customerId: null };
    if (actor?.role !== 'client') {
      throw new DomainError('invalid_input', NEEDS_ATTENTION, {
        items: ['Sign in as a client to pick your own registered shears, or list them by kind.'],
      });
    }
    const own = new Map(
      (
        await this.dataSource.query<{ id: string; tool_kind: ToolKind; edge_type: EdgeType; customer_id: string }[]>(
          `SELECT s.id, s.tool_kind, s.edge_type, s.customer_id FROM shears s JOIN customers c ON c.id = s.customer_id
            WHERE s.id = ANY($1) AND c.user_id = $2 AND c.active AND s.status = 'in-service'`,
          [shearIds, actor.id],
        )
      ).map((row) => [row.id, row]),
    );
    const fields: Record<string, string[]> = {};
    const items = lines.map((line, position): ItemRow => {
      if (!line.shearId) {
        return { position, toolKind: line.toolKind!, edgeType: line.edgeType!, count: line.count!, shearId: null };
      }
      const shear = own.get(line.shearId);
      if (!shear) fields[`items.${position}.shearId`] = ['Choose one of your own shears in service.'];
      if (line.count !== undefined && line.count !== 1)
        fields[`items.${position}.count`] = ['An own shear counts once.'];
      if (shearIds.indexOf(line.shearId) !== shearIds.lastIndexOf(line.shearId)) {
        fields[`items.${position}.shearId`] = ['This shear is listed twice.'];
      }
      return {
        position,
        toolKind: shear?.tool_kind ?? 'straight',
        edgeType: shear?.edge_type ?? 'beveled',
        count: 1,
        shearId: line.shearId,
      };
    });
    if (Object.keys(fields).length > 0) throw new DomainError('invalid_input', NEEDS_ATTENTION, fields);
    const owners = new Set([...own.values()].map((row) => row.customer_id));
    return { items, customerId: owners.size === 1 ? [...owners][0]! : null };
  }

  /** The day's row is locked first; then its stop, cutoff and free minutes are read and judged. */
  private async requireRoom(
    manager: EntityManager,
    routeDayId: string,
    stopId: string,
    minutes: number,
    bookingId: string | null,
  ): Promise<PublicDayDto> {
    const exists = await this.days.lock(manager, routeDayId);
    const day = exists ? await this.days.onDay(manager, routeDayId, stopId, bookingId) : null;
    if (!day) {
      throw new DomainError('invalid_input', NEEDS_ATTENTION, {
        routeDayId: ['The stop is not on that route day. Choose one of the days listed.'],
      });
    }
    if (!this.days.isOpen(day.cutoff)) {
      const message = `Bookings for ${longDayLabel(day.day)} closed at ${closedAt(day.cutoff)}. Choose a later day.`;
      throw new DomainError('conflict', message, { routeDayId: [message] });
    }
    if (minutes > day.bookableMinutesLeft) {
      const upcoming = (await this.days.upcoming([stopId], bookingId)).get(stopId) ?? [];
      const nextDay =
        upcoming.find((d) => d.routeDayId !== routeDayId && d.open && d.bookableMinutesLeft >= minutes) ?? null;
      const message =
        `${longDayLabel(day.day)} is fully booked for ${minutes} bench minutes` +
        (nextDay ? `; ${longDayLabel(nextDay.day)} has room.` : '; no later day has room yet: try mail-in.');
      throw new DayFullError(message, { routeDayId: [message] }, nextDay);
    }
    return day;
  }

  private async requireChangeable(manager: EntityManager, booking: Booking): Promise<void> {
    if (booking.status === 'checked-in') {
      throw new DomainError('conflict', 'These shears are already checked in at the stop: ask the sharpener.');
    }
    if (booking.status === 'cancelled') throw new DomainError('conflict', 'This booking is cancelled.');
    if (!booking.day) return;
    const cutoff = bookingCutoff(booking.day, await this.days.cutoffSetting(manager));
    if (!this.days.isOpen(cutoff)) {
      throw new DomainError(
        'conflict',
        `Changes for the visit on ${longDayLabel(booking.day)} closed at ${closedAt(cutoff)}. Call the office.`,
      );
    }
  }

  private async lockBooking(manager: EntityManager, id: string): Promise<Booking> {
    const booking = await manager
      .getRepository(Booking)
      .createQueryBuilder('b')
      .setLock('pessimistic_write')
      .where('b.id = :id', { id })
      .getOneOrFail();
    booking.items = await manager.getRepository(BookingItem).findBy({ bookingId: id });
    return booking;
  }

  private async byToken(token: string): Promise<Booking> {
    const booking = TOKEN.test(token)
      ? await this.dataSource.getRepository(Booking).findOneBy({ manageTokenHash: hashSecret(token) })
      : null;
    if (!booking)
      throw new DomainError('invalid_token', 'This booking link is not valid. Check the link in your e-mail.');
    return booking;
  }

  private async replay(booking: Booking): Promise<{ result: CreatedBookingDto; created: boolean }> {
    const view = toPublicBooking(await this.views.one(booking.id));
    return {
      result: { booking: view, manageUrl: manageUrl(this.appUrl, this.tokenFor(booking.idempotencyKey)) },
      created: false,
    };
  }

  /** The link's token follows from the form's key, so a resubmitted form gets the same link back; only its hash is kept. */
  private tokenFor(idempotencyKey: string): string {
    return createHmac('sha256', this.linkKey).update(idempotencyKey).digest('base64url');
  }

  private async requireStop(id: string): Promise<Stop> {
    const stop = await this.dataSource
      .getRepository(Stop)
      .createQueryBuilder('s')
      .where('s.id = :id AND s.active AND s.latitude IS NOT NULL AND s.longitude IS NOT NULL', { id })
      .getOne();
    if (!stop) throw new DomainError('invalid_input', NEEDS_ATTENTION, { stopId: ['Choose a stop from the list.'] });
    return stop;
  }

  /** A customer of the stop with the same e-mail: the check-in then knows whose shears these are. */
  private async matchCustomer(manager: EntityManager, stopId: string, email: string): Promise<string | null> {
    const [row] = await manager.query<{ id: string }[]>(
      `SELECT id FROM customers WHERE stop_id = $1 AND active AND lower(email) = $2 ORDER BY created_at LIMIT 1`,
      [stopId, email.toLowerCase()],
    );
    return row?.id ?? null;
  }

  private async estimateCents(items: readonly Item[], taxRateBp: number): Promise<number | null> {
    const current = await this.rates.current();
    return current ? estimateBooking(items, current.card, taxRateBp).estimateCents : null;
  }

  private async currency(): Promise<string> {
    return (await this.rates.current())?.card.currency ?? 'USD';
  }
}

function toItems(items: readonly BookingItemDto[]): Item[] {
  return items.map((item) => ({ toolKind: item.toolKind, edgeType: item.edgeType, count: item.count }));
}

type ItemRow = Item & { position: number; shearId: string | null };

function itemRows(items: readonly Item[]): ItemRow[] {
  return items.map((item, position) => ({
    position,
    toolKind: item.toolKind,
    edgeType: item.edgeType,
    count: item.count,
    shearId: null,
  }));
}

function closedAt(cutoff: { date: string; minute: number }): string {
  return `${formatTimeOfDay(cutoff.minute)} on ${longDayLabel(cutoff.date)}`;
}

function isDuplicateKey(error: unknown): boolean {
  const e = error as { code?: unknown; constraint?: unknown; driverError?: { code?: unknown } };
  return (e.code ?? e.driverError?.code) === '23505';
}
