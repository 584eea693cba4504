import type { Repository } from 'typeorm';
import type { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import { Stop } from '../stops/entities/stop.entity';
import { User } from '../users/entities/user.entity';
import { CustomersService } from './customers.service';
import { CustomerStopHistory } from './entities/customer-stop-history.entity';
import { Customer } from './entities/customer.entity';

const office: Actor = { id: 'office-1', email: 'o@x.test', name: 'Office', role: 'office' };

interface World {
  emailTaken?: boolean;
  stopExists?: boolean;
  user?: Partial<User> | null;
  accountHolder?: Partial<Customer> | null;
  stored?: Customer;
}

function setUp(world: World) {
  const calls: string[] = [];
  const saved: Customer[] = [];
  const opened: { customerId: string; stopId: string }[] = [];
  const emailQuery = {
    where: () => emailQuery,
    andWhere: () => emailQuery,
    getExists: () => Promise.resolve(world.emailTaken ?? false),
  };
  const closing = {
    update: () => closing,
    set: () => closing,
    where: (sql: string, params: { id: string }) => {
      calls.push(`close open stretch of ${params.id}`);
      return closing;
    },
    execute: () => Promise.resolve(),
  };
  const tx = {
    getRepository: (entity: unknown) => {
      if (entity === Customer) {
        return {
          create: (row: Partial<Customer>) => ({ id: 'new-1', ...row }),
          save: (row: Customer) => {
            calls.push('save customer');
            saved.push({ ...row });
            return Promise.resolve(row);
          },
        };
      }
      if (entity === CustomerStopHistory) {
        return {
          insert: (row: { customerId: string; stopId: string }) => {
            calls.push(`open stretch at ${row.stopId}`);
            opened.push({ customerId: row.customerId, stopId: row.stopId });
            return Promise.resolve();
          },
        };
      }
      throw new Error('unexpected repository in the transaction');
    },
    createQueryBuilder: () => closing,
  };
  const manager = {
    getRepository: (entity: unknown) => {
      if (entity === Stop) return { existsBy: () => Promise.resolve(world.stopExists ?? true) };
      if (entity === User) return { findOneBy: () => Promise.resolve(world.user ?? null) };
      throw new Error('unexpected repository');
    },
    transaction: jest.fn(async (work: (m: typeof tx) => Promise<unknown>) => {
      calls.push('begin');
      const result = await work(tx);
      calls.push('commit');
      return result;
    }),
  };
  const customers = {
    manager,
    createQueryBuilder: () => emailQuery,
    findOneBy: () => Promise.resolve(world.accountHolder ?? null),
  } as unknown as Repository<Customer>;
  const access = {
    requireCustomer: jest.fn(() => Promise.resolve(world.stored)),
  } as unknown as RegistryAccess;
  const sut = new CustomersService(customers, access);
  // The detail read-back is covered end to end; here only the writes matter.
  jest
    .spyOn(sut as unknown as { detail: (c: Customer) => Promise<unknown> }, 'detail')
    .mockImplementation((c) => Promise.resolve(c));
  return { sut, calls, saved, opened, manager };
}

const stored = (overrides: Partial<Customer> = {}): Customer =>
  ({
    id: 'cust-1',
    name: 'Avery',
    email: 'avery@x.test',
    phone: null,
    stopId: 'stop-a',
    userId: null,
    notes: '',
    visitNoticeConsent: false,
    active: true,
    ...overrides,
  }) as Customer;

describe('CustomersService', () => {
  it('refuses an e-mail in use with a conflict on the email field, before writing anything', async () => {
    const { sut, manager } = setUp({ emailTaken: true });
    await expect(sut.create(office, { name: 'B', email: 'taken@x.test' })).rejects.toMatchObject({
      code: 'conflict',
      fields: { email: [expect.stringMatching(/already has that e-mail/)] },
    });
    expect(manager.transaction).not.toHaveBeenCalled();
  });

  it('refuses a stop that does not exist on the stopId field', async () => {
    const { sut } = setUp({ stopExists: false });
    await expect(sut.create(office, { name: 'B', stopId: 'nowhere' })).rejects.toMatchObject({
      code: 'invalid_input',
      fields: { stopId: [expect.any(String)] },
    });
  });

  it('links only client accounts, and each to one customer', async () => {
    await expect(
      setUp({ user: { id: 'u1', role: 'sharpener' } }).sut.create(office, { name: 'B', userId: 'u1' }),
    ).rejects.toMatchObject({ code: 'invalid_input', fields: { userId: expect.any(Array) } });
    await expect(
      setUp({ user: { id: 'u1', role: 'client' }, accountHolder: { id: 'other' } }).sut.create(office, {
        name: 'B',
        userId: 'u1',
      }),
    ).rejects.toMatchObject({ code: 'conflict', fields: { userId: expect.any(Array) } });
    const relinked = setUp({ user: { id: 'u1', role: 'client' }, accountHolder: { id: 'cust-1' }, stored: stored() });
    await expect(relinked.sut.update(office, 'cust-1', { userId: 'u1' })).resolves.toMatchObject({ userId: 'u1' });
  });

  it('opens the first stop stretch in the same transaction as the new customer', async () => {
    const { sut, calls, opened } = setUp({});
    await sut.create(office, { name: 'New', email: 'new@x.test', stopId: 'stop-a' });
    expect(calls).toEqual(['begin', 'save customer', 'open stretch at stop-a', 'commit']);
    expect(opened).toEqual([{ customerId: 'new-1', stopId: 'stop-a' }]);
  });

  it('on a move, saves, closes the open stretch and opens the next one inside one transaction', async () => {
    const { sut, calls, saved } = setUp({ stored: stored() });
    await sut.update(office, 'cust-1', { stopId: 'stop-b' });
    expect(calls).toEqual([
      'begin',
      'save customer',
      'close open stretch of cust-1',
      'open stretch at stop-b',
      'commit',
    ]);
    expect(saved[0]).toMatchObject({ stopId: 'stop-b', email: 'avery@x.test' });
  });

  it('leaves the history alone when the stop does not change, and only closes it for a mail-in move', async () => {
    const same = setUp({ stored: stored() });
    await same.sut.update(office, 'cust-1', { stopId: 'stop-a', notes: 'Chair 3' });
    expect(same.calls).toEqual(['begin', 'save customer', 'commit']);
    const mailIn = setUp({ stored: stored() });
    await mailIn.sut.update(office, 'cust-1', { stopId: null });
    expect(mailIn.calls).toEqual(['begin', 'save customer', 'close open stretch of cust-1', 'commit']);
  });

  it('does not check its own e-mail against itself', async () => {
    const { sut } = setUp({ stored: stored(), emailTaken: true });
    await expect(sut.update(office, 'cust-1', { email: 'avery@x.test', name: 'Avery L' })).resolves.toMatchObject({
      name: 'Avery L',
    });
  });
});
