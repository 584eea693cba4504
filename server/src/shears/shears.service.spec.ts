import type { ConfigService } from '@nestjs/config';
import type { Repository } from 'typeorm';
import type { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import type { AppConfig } from '../config/environment';
import { Customer } from '../customers/entities/customer.entity';
import { ShearHistoryEntry } from './entities/shear-history-entry.entity';
import { Shear } from './entities/shear.entity';
import { ShearsService } from './shears.service';

const office: Actor = { id: 'office-1', email: 'o@x.test', name: 'Office', role: 'office' };
const customers: Record<string, Partial<Customer>> = {
  'cust-mara': { id: 'cust-mara', name: 'Mara' },
  'cust-bryn': { id: 'cust-bryn', name: 'Bryn' },
};

function setUp(stored?: Partial<Shear>) {
  const calls: string[] = [];
  const history: Partial<ShearHistoryEntry>[] = [];
  const savedShears: Partial<Shear>[] = [];
  const tx = {
    query: (sql: string) => {
      calls.push(sql);
      return Promise.resolve([{ serial: '123' }]);
    },
    getRepository: (entity: unknown) => {
      if (entity === Shear) {
        return {
          create: (row: Partial<Shear>) => row,
          save: (row: Partial<Shear>) => {
            calls.push('save shear');
            savedShears.push({ ...row });
            return Promise.resolve({ id: 'shear-1', ...row });
          },
        };
      }
      if (entity === ShearHistoryEntry) {
        return {
          insert: (row: Partial<ShearHistoryEntry>) => {
            calls.push(`history ${row.kind}`);
            history.push(row);
            return Promise.resolve();
          },
        };
      }
      throw new Error('unexpected repository in the transaction');
    },
  };
  const manager = {
    getRepository: (entity: unknown) => {
      if (entity === Customer) return { findOneBy: ({ id }: { id: string }) => Promise.resolve(customers[id] ?? null) };
      throw new Error('unexpected repository');
    },
    transaction: jest.fn(async (work: (m: typeof tx) => Promise<unknown>) => {
      calls.push('begin');
      const result = await work(tx);
      calls.push('commit');
      return result;
    }),
  };
  const access = { requireShear: jest.fn(() => Promise.resolve(stored)) } as unknown as RegistryAccess;
  const config = { get: () => 'America/Chicago' } as unknown as ConfigService<AppConfig, true>;
  const sut = new ShearsService({ manager } as unknown as Repository<Shear>, access, config);
  jest.spyOn(sut, 'detail').mockImplementation((id: string) => Promise.resolve({ id } as never));
  return { sut, calls, history, savedShears, manager };
}

const body = { customerId: 'cust-mara', lengthIn: 6.5, edgeType: 'convex', toolKind: 'straight' } as const;

describe('ShearsService.create', () => {
  it('takes the tag serial inside the insert transaction and records the registration', async () => {
    const { sut, calls, history, savedShears } = setUp();
    await sut.create(office, body);
    expect(calls).toEqual([
      'begin',
      "SELECT nextval('shear_tag_serial') AS serial",
      'save shear',
      'history registered',
      'commit',
    ]);
    expect(savedShears[0]).toMatchObject({ tagCode: 'KR-000123', handedness: 'right', use: 'hair', make: '' });
    expect(history[0]).toMatchObject({
      shearId: 'shear-1',
      summary: 'Registered to Mara',
      recordedBy: 'office-1',
      happenedOn: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/),
    });
  });

  it('refuses an unknown customer or an off-step length before taking a serial', async () => {
    const { sut, manager } = setUp();
    await expect(sut.create(office, { ...body, customerId: 'nobody' })).rejects.toMatchObject({
      code: 'invalid_input',
      fields: { customerId: [expect.any(String)] },
    });
    await expect(sut.create(office, { ...body, lengthIn: 6.3 })).rejects.toMatchObject({ field: 'lengthIn' });
    expect(manager.transaction).not.toHaveBeenCalled();
  });
});

describe('ShearsService.update', () => {
  const stored = (): Partial<Shear> => ({
    id: 'shear-1',
    customerId: 'cust-mara',
    lengthIn: 6,
    edgeType: 'beveled',
    toolKind: 'thinning',
    handedness: 'right',
    use: 'hair',
    status: 'in-service',
    make: 'Corvane',
    model: '',
    notes: '',
  });

  it('writes a status line and a moved line with the change, in one transaction', async () => {
    const { sut, calls, history, savedShears } = setUp(stored());
    await sut.update(office, 'shear-1', { status: 'lost', customerId: 'cust-bryn' });
    expect(calls).toEqual(['begin', 'save shear', 'history status', 'history moved', 'commit']);
    expect(history.map((row) => row.summary)).toEqual(['Marked lost', 'Moved from Mara to Bryn']);
    expect(savedShears[0]).toMatchObject({ status: 'lost', customerId: 'cust-bryn', make: 'Corvane' });
  });

  it('adds no history when neither the status nor the customer changes, and clears make with null', async () => {
    const { sut, calls, savedShears } = setUp(stored());
    await sut.update(office, 'shear-1', { status: 'in-service', customerId: 'cust-mara', make: null as never });
    expect(calls).toEqual(['begin', 'save shear', 'commit']);
    expect(savedShears[0]).toMatchObject({ make: '' });
  });

  it('checks the merged shear and refuses clearing the fields a shear always has', async () => {
    await expect(setUp(stored()).sut.update(office, 'shear-1', { lengthIn: 7.1 })).rejects.toMatchObject({
      field: 'lengthIn',
    });
    await expect(
      setUp(stored()).sut.update(office, 'shear-1', { edgeType: null as never, status: null as never }),
    ).rejects.toMatchObject({
      code: 'invalid_input',
      fields: { edgeType: expect.any(Array), status: expect.any(Array) },
    });
  });
});
