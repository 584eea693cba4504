import type { ConfigService } from '@nestjs/config';
import type { Repository } from 'typeorm';
import type { AuditRecord, AuditService } from '../audit/audit.service';
import type { Actor } from '../auth/actor';
import type { RefreshTokensService } from '../auth/refresh-tokens.service';
import type { UserTokensService } from '../auth/user-tokens.service';
import type { AppConfig } from '../config/environment';
import type { MailOutbox } from '../mail/mail-outbox';
import type { User } from './entities/user.entity';
import { UsersService } from './users.service';

const person = (role: User['role'], id = `${role}-1`): User =>
  ({ id, email: `${id}@x.test`, name: id, role, passwordHash: 'h', active: true }) as User;

describe('UsersService.update', () => {
  let stored: User;
  let revokeAllFor: jest.Mock;
  let logged: AuditRecord[];
  let sut: UsersService;

  function setUp(target: User) {
    stored = target;
    revokeAllFor = jest.fn().mockResolvedValue(undefined);
    logged = [];
    const repository = {
      findOneBy: jest.fn().mockImplementation(() => Promise.resolve(stored)),
      save: jest.fn().mockImplementation((user: User) => Promise.resolve({ ...user })),
    };
    const manager = { getRepository: () => repository };
    const users = {
      ...repository,
      manager: { transaction: (work: (m: typeof manager) => Promise<unknown>) => work(manager) },
    } as unknown as Repository<User>;
    const audit = {
      record: (entry: AuditRecord) => {
        logged.push(entry);
        return Promise.resolve();
      },
    } as unknown as AuditService;
    sut = new UsersService(
      users,
      {} as UserTokensService,
      { revokeAllFor } as unknown as RefreshTokensService,
      {} as MailOutbox,
      {} as ConfigService<AppConfig, true>,
      audit,
    );
  }

  const office: Actor = { id: 'office-1', email: 'o@x.test', name: 'Office', role: 'office' };

  it('changes a role the actor may give, and logs from and to', async () => {
    setUp(person('client'));
    await expect(sut.update(office, 'client-1', { role: 'sharpener' })).resolves.toMatchObject({ role: 'sharpener' });
    expect(logged).toEqual([
      {
        action: 'role-changed',
        actor: office,
        subject: { type: 'user', id: 'client-1' },
        detail: { email: 'client-1@x.test', from: 'client', to: 'sharpener' },
      },
    ]);
  });

  it('revokes every session of a deactivated user, and logs it', async () => {
    setUp(person('sharpener'));
    await sut.update(office, 'sharpener-1', { active: false });
    expect(revokeAllFor).toHaveBeenCalledWith('sharpener-1');
    expect(logged.map((entry) => entry.action)).toEqual(['user-deactivated']);
  });

  it('logs nothing when only the name changes', async () => {
    setUp(person('sharpener'));
    await sut.update(office, 'sharpener-1', { name: 'Renamed', role: 'sharpener', active: true });
    expect(logged).toEqual([]);
  });

  it('does not let the office change an owner or make one', async () => {
    setUp(person('owner'));
    await expect(sut.update(office, 'owner-1', { name: 'X' })).rejects.toMatchObject({ code: 'forbidden' });
    setUp(person('client'));
    await expect(sut.update(office, 'client-1', { role: 'owner' })).rejects.toMatchObject({ code: 'forbidden' });
  });

  it('does not let anyone deactivate themselves or change their own role', async () => {
    setUp(person('office', 'office-1'));
    await expect(sut.update(office, 'office-1', { active: false })).rejects.toMatchObject({ code: 'forbidden' });
    await expect(sut.update(office, 'office-1', { role: 'client' })).rejects.toMatchObject({ code: 'forbidden' });
    await expect(sut.update(office, 'office-1', { name: 'New name' })).resolves.toMatchObject({ name: 'New name' });
  });
});
