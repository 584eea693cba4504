import type { ConfigService } from '@nestjs/config';
import { DEFAULT_CADENCE_WEEKS, RuleError, addDays } from '@keenroute/shared';
import type { Repository } from 'typeorm';
import type { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import type { AppConfig } from '../config/environment';
import type { GeocodeResultDto } from '../geocoding/dto/geocode-result.dto';
import type { GeocoderClient } from '../geocoding/geocoder-client';
import type { User } from '../users/entities/user.entity';
import type { CreateStopDto } from './dto/create-stop.dto';
import type { StopRow } from './dto/stop-response.dto';
import type { StopVisit } from './entities/stop-visit.entity';
import type { Stop } from './entities/stop.entity';
import type { StopListing } from './stop-listing';
import { StopsService } from './stops.service';

describe('StopsService', () => {
  const office: Actor = { id: 'office-1', email: 'o@x.test', name: 'Office', role: 'office' };
  const people: Record<string, Partial<User>> = {
    'sharpener-1': { id: 'sharpener-1', name: 'Robin', role: 'sharpener', active: true },
    'retired-1': { id: 'retired-1', name: 'Ash', role: 'sharpener', active: false },
    'client-1': { id: 'client-1', name: 'Kit', role: 'client', active: true },
  };
  const found: GeocodeResultDto = {
    status: 'found',
    message: null,
    candidates: [{ label: '104 Alder Row, Larkhaven', latitude: 44.8243, longitude: -92.417 }],
  };
  const body: CreateStopDto = {
    name: 'Alder Salon (demo)',
    kind: 'grooming-shop',
    street: '104 Alder Row',
    city: 'Larkhaven',
  };

  let saved: Stop[];
  let saveError: Error | undefined;
  let existing: Stop;
  const search = jest.fn<Promise<GeocodeResultDto>, [string]>();
  const visitSave = jest.fn((visit: Partial<StopVisit>) => Promise.resolve({ ...visit, id: 'visit-1' }));
  let sut: StopsService;

  beforeEach(() => {
    saved = [];
    saveError = undefined;
    search.mockReset().mockResolvedValue(found);
    visitSave.mockClear();
    existing = {
      id: 'stop-1',
      name: 'Alder Salon (demo)',
      kind: 'salon',
      street: '104 Alder Row',
      city: 'Larkhaven',
      region: '',
      postalCode: '',
      country: 'US',
      latitude: 44.8243,
      longitude: -92.417,
      geocodeStatus: 'found',
      cadenceWeeks: 8,
      assignedSharpenerId: 'retired-1',
      managerUserId: null,
      openingHours: {},
    } as unknown as Stop;
    const stops = {
      create: (row: Partial<Stop>) => ({ ...row }),
      save: (row: Stop) => {
        if (saveError) return Promise.reject(saveError);
        saved.push({ ...row });
        return Promise.resolve({ ...row, id: row.id ?? 'stop-new' });
      },
    } as unknown as Repository<Stop>;
    const visits = {
      create: (row: Partial<StopVisit>) => row,
      save: visitSave,
      existsBy: () => Promise.resolve(false),
    } as unknown as Repository<StopVisit>;
    const users = {
      findOneBy: ({ id }: { id: string }) => Promise.resolve(people[id] ?? null),
    } as unknown as Repository<User>;
    const listing = {
      byId: (id: string) => Promise.resolve({ stop: { ...saved.at(-1), id } } as unknown as StopRow),
    } as unknown as StopListing;
    const access = { requireStop: () => Promise.resolve(existing) } as unknown as RegistryAccess;
    const config = { get: () => 'America/Chicago' } as unknown as ConfigService<AppConfig, true>;
    sut = new StopsService(stops, visits, users, listing, access, { search } as unknown as GeocoderClient, config);
  });

  describe('create', () => {
    it('looks the address up, places the pin on one match, and takes the default cadence for the kind', async () => {
      const result = await sut.create(office, { ...body, region: 'Lakeshore', postalCode: '55901' });
      expect(search).toHaveBeenCalledWith('104 Alder Row, Larkhaven, Lakeshore 55901, US');
      expect(saved[0]).toMatchObject({
        latitude: 44.8243,
        longitude: -92.417,
        geocodeStatus: 'found',
        cadenceWeeks: DEFAULT_CADENCE_WEEKS['grooming-shop'],
      });
      expect(result.geocoding).toEqual(found);
    });

    it('keeps coordinates given in the body without asking the geocoder', async () => {
      const manual = await sut.create(office, { ...body, latitude: 1, longitude: 2, cadenceWeeks: 3 });
      const picked = await sut.create(office, { ...body, latitude: 3, longitude: 4, geocodeChoice: 'picked' });
      expect(search).not.toHaveBeenCalled();
      expect(saved.map((s) => [s.latitude, s.geocodeStatus, s.cadenceWeeks])).toEqual([
        [1, 'manual', 3],
        [3, 'picked', DEFAULT_CADENCE_WEEKS['grooming-shop']],
      ]);
      expect([manual.geocoding.status, picked.geocoding.status]).toEqual(['manual', 'picked']);
    });

    it.each([
      [
        'ambiguous',
        {
          status: 'ambiguous',
          message: 'The address matches 2 places.',
          candidates: [...found.candidates, ...found.candidates],
        },
      ],
      ['failed', { status: 'failed', message: 'The geocoder could not be reached.', candidates: [] }],
    ] as const)('saves the stop without a pin when the look-up is %s', async (status, answer) => {
      search.mockResolvedValue({ ...answer, candidates: [...answer.candidates] });
      const result = await sut.create(office, body);
      expect(saved[0]).toMatchObject({ latitude: null, longitude: null, geocodeStatus: status });
      expect(result.geocoding).toMatchObject({ status, message: answer.message });
    });

    it('refuses geocodeChoice without coordinates, and broken opening hours, before saving anything', async () => {
      await expect(sut.create(office, { ...body, geocodeChoice: 'picked' })).rejects.toMatchObject({
        code: 'invalid_input',
        fields: { geocodeChoice: [expect.stringMatching(/goes with latitude and longitude/)] },
      });
      const hours = sut.create(office, { ...body, openingHours: { fri: [{ opens: '9:00', closes: '17:00' }] } });
      await expect(hours).rejects.toBeInstanceOf(RuleError);
      await expect(hours).rejects.toMatchObject({ field: 'openingHours.fri[0]' });
      expect(saved).toEqual([]);
      expect(search).not.toHaveBeenCalled();
    });

    it('checks the assigned sharpener and the shop manager, naming each field', async () => {
      await expect(
        sut.create(office, { ...body, assignedSharpenerId: 'retired-1', managerUserId: 'sharpener-1' }),
      ).rejects.toMatchObject({
        code: 'invalid_input',
        fields: { assignedSharpenerId: [expect.any(String)], managerUserId: [expect.any(String)] },
      });
      await sut.create(office, { ...body, assignedSharpenerId: 'sharpener-1', managerUserId: 'client-1' });
      expect(saved).toHaveLength(1);
    });

    it('turns the name-and-address unique index into a 409 on name', async () => {
      saveError = Object.assign(new Error('duplicate key'), { code: '23505', constraint: 'stops_name_address_key' });
      await expect(sut.create(office, body)).rejects.toMatchObject({
        code: 'conflict',
        fields: { name: [expect.any(String)] },
      });
    });
  });

  describe('update', () => {
    it('leaves the pin alone when the address is unchanged (in any case), and keeps an unchanged sharpener', async () => {
      const result = await sut.update(office, 'stop-1', { street: '104 ALDER ROW', assignedSharpenerId: 'retired-1' });
      expect(search).not.toHaveBeenCalled();
      expect(result.geocoding.status).toBe('unchanged');
      expect(saved[0]).toMatchObject({ latitude: 44.8243, geocodeStatus: 'found' });
    });

    it('looks a changed address up and drops the old pin when nothing is found', async () => {
      search.mockResolvedValue({ status: 'failed', message: 'No place was found.', candidates: [] });
      await sut.update(office, 'stop-1', { postalCode: '55902' });
      expect(search).toHaveBeenCalledWith('104 Alder Row, Larkhaven, 55902, US');
      expect(saved[0]).toMatchObject({ latitude: null, longitude: null, geocodeStatus: 'failed', postalCode: '55902' });
    });

    it('clears the pin on latitude and longitude null', async () => {
      const result = await sut.update(office, 'stop-1', { latitude: null, longitude: null });
      expect(saved[0]).toMatchObject({ latitude: null, longitude: null, geocodeStatus: 'none' });
      expect(result.geocoding.status).toBe('none');
    });
  });

  describe('recordVisit', () => {
    it("refuses a day after today and defaults to the stop's sharpener only when they may work", async () => {
      const tomorrow = addDays(sut.today(), 1);
      await expect(sut.recordVisit(office, 'stop-1', { workedOn: tomorrow })).rejects.toMatchObject({
        fields: { workedOn: [expect.any(String)] },
      });
      const visit = await sut.recordVisit(office, 'stop-1', { workedOn: '2026-01-05' });
      expect(visit).toEqual({ id: 'visit-1', workedOn: '2026-01-05', sharpener: null });
      const named = await sut.recordVisit(office, 'stop-1', { workedOn: '2026-01-06', sharpenerId: 'sharpener-1' });
      expect(named.sharpener).toEqual({ id: 'sharpener-1', name: 'Robin' });
    });
  });
});
