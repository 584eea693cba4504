import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { DEFAULT_CADENCE_WEEKS, WEEKDAYS, validateOpeningHours, type Weekday } from '@keenroute/shared';
import { Repository } from 'typeorm';
import { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import { GeocoderClient } from '../geocoding/geocoder-client';
import { User } from '../users/entities/user.entity';
import { todayIn } from './business-today';
import type { AccessNotesDto } from './dto/access-notes.dto';
import type { ComingDueQueryDto } from './dto/coming-due-query.dto';
import type { CreateStopDto } from './dto/create-stop.dto';
import type { ListStopsQueryDto } from './dto/list-stops-query.dto';
import type { RecordVisitDto } from './dto/record-visit.dto';
import type { StopGeocodingDto, StopRow, StopVisitDto } from './dto/stop-response.dto';
import type { UpdateStopDto } from './dto/update-stop.dto';
import { StopVisit } from './entities/stop-visit.entity';
import { Stop } from './entities/stop.entity';
import { StopListing } from './stop-listing';
import { planPlacement, placementFrom, type Placement, type StopAddress } from './stop-placement';

type Page<T> = { items: T[]; total: number };
export type SavedStop = { row: StopRow; geocoding: StopGeocodingDto };

const NEEDS_ATTENTION = 'Some fields need attention.';
const WORKER_ROLES = new Set(['sharpener', 'owner']);

@Injectable()
export class StopsService {
  constructor(
    @InjectRepository(Stop) private readonly stops: Repository<Stop>,
    @InjectRepository(StopVisit) private readonly visits: Repository<StopVisit>,
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly listing: StopListing,
    private readonly access: RegistryAccess,
    private readonly geocoder: GeocoderClient,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  /** Today in the business's time zone: the day coming-due dates count from. */
  today(): string {
    return todayIn(this.config.get('BUSINESS_TIME_ZONE', { infer: true }));
  }

  list(actor: Actor, query: ListStopsQueryDto): Promise<Page<StopRow>> {
    return this.listing.list(actor, query, this.today());
  }

  comingDue(actor: Actor, query: ComingDueQueryDto): Promise<Page<StopRow>> {
    return this.listing.comingDue(actor, query, this.today());
  }

  async get(actor: Actor, id: string): Promise<StopRow> {
    await this.access.requireStop(actor, id, 'read');
    return this.row(id);
  }

  async create(actor: Actor, dto: CreateStopDto): Promise<SavedStop> {
    const openingHours = validateOpeningHours(dto.openingHours ?? {});
    await this.checkPeople(dto);
    const address: StopAddress = {
      street: dto.street,
      city: dto.city,
      region: dto.region ?? '',
      postalCode: dto.postalCode ?? '',
      country: dto.country ?? 'US',
    };
    const placement = await this.place(dto, address);
    const stop = this.stops.create({
      ...address,
      name: dto.name,
      kind: dto.kind,
      phone: dto.phone ?? null,
      email: dto.email ?? null,
      openingHours,
      closedDates: tidyDates(dto.closedDates ?? []),
      cadenceWeeks: dto.cadenceWeeks ?? DEFAULT_CADENCE_WEEKS[dto.kind],
      preferredWeekdays: tidyWeekdays(dto.preferredWeekdays ?? []),
      billingMode: dto.billingMode ?? 'customer',
      taxRateBp: dto.taxRateBp ?? 0,
      accessParking: dto.accessParking ?? '',
      accessDoor: dto.accessDoor ?? '',
      accessBestTime: dto.accessBestTime ?? '',
      assignedSharpenerId: dto.assignedSharpenerId ?? null,
      managerUserId: dto.managerUserId ?? null,
      active: dto.active ?? true,
      latitude: null,
      longitude: null,
      geocodeStatus: 'none',
      ...placement.columns,
    });
    const saved = await this.saveUnique(stop);
    return { row: await this.row(saved.id), geocoding: placement.geocoding };
  }

  async update(actor: Actor, id: string, dto: UpdateStopDto): Promise<SavedStop> {
    const stop = await this.access.requireStop(actor, id, 'edit');
    const openingHours = dto.openingHours === undefined ? stop.openingHours : validateOpeningHours(dto.openingHours);
    await this.checkPeople(dto, stop);
    const address: StopAddress = {
      street: dto.street ?? stop.street,
      city: dto.city ?? stop.city,
      region: dto.region ?? stop.region,
      postalCode: dto.postalCode ?? stop.postalCode,
      country: dto.country ?? stop.country,
    };
    const placement = await this.place(dto, address, stop);
    const kept = <K extends keyof Stop>(key: K, value: Stop[K] | null | undefined): Stop[K] => value ?? stop[key];
    const cleared = <K extends keyof Stop>(key: K, value: Stop[K] | undefined): Stop[K] =>
      value === undefined ? stop[key] : value;
    Object.assign(stop, {
      ...address,
      name: kept('name', dto.name),
      kind: kept('kind', dto.kind),
      phone: cleared('phone', dto.phone),
      email: cleared('email', dto.email),
      openingHours,
      closedDates: dto.closedDates ? tidyDates(dto.closedDates) : stop.closedDates,
      cadenceWeeks: kept('cadenceWeeks', dto.cadenceWeeks),
      preferredWeekdays: dto.preferredWeekdays ? tidyWeekdays(dto.preferredWeekdays) : stop.preferredWeekdays,
      billingMode: kept('billingMode', dto.billingMode),
      taxRateBp: kept('taxRateBp', dto.taxRateBp),
      accessParking: kept('accessParking', dto.accessParking),
      accessDoor: kept('accessDoor', dto.accessDoor),
      accessBestTime: kept('accessBestTime', dto.accessBestTime),
      assignedSharpenerId: cleared('assignedSharpenerId', dto.assignedSharpenerId),
      managerUserId: cleared('managerUserId', dto.managerUserId),
      active: kept('active', dto.active),
      ...placement.columns,
    });
    await this.saveUnique(stop);
    return { row: await this.row(stop.id), geocoding: placement.geocoding };
  }

  async updateAccessNotes(actor: Actor, id: string, dto: AccessNotesDto): Promise<StopRow> {
    const stop = await this.access.requireStop(actor, id, 'edit-access-notes');
    await this.stops.update(
      { id: stop.id },
      {
        accessParking: dto.accessParking ?? stop.accessParking,
        accessDoor: dto.accessDoor ?? stop.accessDoor,
        accessBestTime: dto.accessBestTime ?? stop.accessBestTime,
      },
    );
    return this.row(stop.id);
  }

  async listVisits(actor: Actor, id: string): Promise<Page<StopVisitDto>> {
    const stop = await this.access.requireStop(actor, id, 'read');
    const rows = await this.visits
      .createQueryBuilder('visit')
      .leftJoin(User, 'sharpener', 'sharpener.id = visit.sharpenerId')
      .select(['visit.id AS id', 'visit.worked_on::text AS worked_on', 'visit.sharpenerId AS sharpener_id'])
      .addSelect('sharpener.name', 'sharpener_name')
      .where('visit.stopId = :stopId', { stopId: stop.id })
      .orderBy('visit.workedOn', 'DESC')
      .addOrderBy('visit.createdAt', 'DESC')
      .getRawMany<{ id: string; worked_on: string; sharpener_id: string | null; sharpener_name: string | null }>();
    const items = rows.map((row) => ({
      id: row.id,
      workedOn: row.worked_on,
      sharpener: row.sharpener_id ? { id: row.sharpener_id, name: row.sharpener_name ?? '' } : null,
    }));
    return { items, total: items.length };
  }

  async recordVisit(actor: Actor, id: string, dto: RecordVisitDto): Promise<StopVisitDto> {
    const stop = await this.access.requireStop(actor, id, 'edit');
    if (dto.workedOn > this.today()) {
      throw new DomainError('invalid_input', NEEDS_ATTENTION, {
        workedOn: ['A visit is recorded once worked: pick today or an earlier day.'],
      });
    }
    const sharpenerId = dto.sharpenerId ?? stop.assignedSharpenerId;
    const sharpener = sharpenerId ? await this.worker(sharpenerId) : null;
    if (dto.sharpenerId && !sharpener) {
      throw new DomainError('invalid_input', NEEDS_ATTENTION, {
        sharpenerId: ['Choose an active sharpener or owner.'],
      });
    }
    if (await this.visits.existsBy({ stopId: stop.id, workedOn: dto.workedOn })) {
      throw new DomainError('conflict', `A visit on ${dto.workedOn} is already recorded for this stop.`, {
        workedOn: ['A visit on this day is already recorded.'],
      });
    }
    const visit = await this.visits.save(
      this.visits.create({ stopId: stop.id, workedOn: dto.workedOn, sharpenerId: sharpener?.id ?? null }),
    );
    return {
      id: visit.id,
      workedOn: dto.workedOn,
      sharpener: sharpener ? { id: sharpener.id, name: sharpener.name } : null,
    };
  }

  private async row(id: string): Promise<StopRow> {
    const row = await this.listing.byId(id, this.today());
    if (!row) throw notFound('The stop');
    return row;
  }

  /** Settles the pin, asking the geocoder when the plan says so; never fails because of the geocoder. */
  private async place(dto: CreateStopDto | UpdateStopDto, address: StopAddress, existing?: Stop): Promise<Placement> {
    const plan = planPlacement(dto, address, existing);
    return plan.kind === 'settled' ? plan.placement : placementFrom(await this.geocoder.search(plan.query));
  }

  /** An active sharpener or owner: who may be assigned a stop or have worked a visit. */
  private async worker(id: string): Promise<User | null> {
    const user = await this.users.findOneBy({ id });
    return user && user.active && WORKER_ROLES.has(user.role) ? user : null;
  }

  /** The people a stop points at must fit their part; unchanged ids are not checked again. */
  private async checkPeople(dto: CreateStopDto | UpdateStopDto, existing?: Stop): Promise<void> {
    const fields: Record<string, string[]> = {};
    const sharpenerId = dto.assignedSharpenerId;
    if (sharpenerId && sharpenerId !== existing?.assignedSharpenerId && !(await this.worker(sharpenerId))) {
      fields.assignedSharpenerId = ['Assign the stop to an active sharpener or owner.'];
    }
    const managerId = dto.managerUserId;
    if (managerId && managerId !== existing?.managerUserId) {
      const manager = await this.users.findOneBy({ id: managerId });
      if (manager?.role !== 'client') fields.managerUserId = ["The shop manager must be a client's account."];
    }
    if (Object.keys(fields).length > 0) throw new DomainError('invalid_input', NEEDS_ATTENTION, fields);
  }

  private async saveUnique(stop: Stop): Promise<Stop> {
    try {
      return await this.stops.save(stop);
    } catch (error) {
      if (isUniqueViolation(error, 'stops_name_address_key')) {
        const message = 'A stop with this name at this address already exists.';
        throw new DomainError('conflict', message, { name: [message] });
      }
      throw error;
    }
  }
}

function isUniqueViolation(error: unknown, constraint: string): boolean {
  const { code, constraint: violated } = (error ?? {}) as { code?: unknown; constraint?: unknown };
  return code === '23505' && violated === constraint;
}

const tidyDates = (dates: readonly string[]) => [...new Set(dates)].sort();
const tidyWeekdays = (days: readonly Weekday[]) => WEEKDAYS.filter((day) => days.includes(day));
