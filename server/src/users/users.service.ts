import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { canAssignRole } from '@keenroute/shared';
import { EntityManager, IsNull, Not, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { Actor } from '../auth/actor';
import { RefreshTokensService } from '../auth/refresh-tokens.service';
import { UserTokensService } from '../auth/user-tokens.service';
import { likePattern } from '../common/pagination.dto';
import { DomainError, notFound } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import { MailOutbox } from '../mail/mail-outbox';
import { invitationMail } from '../mail/templates/account-links';
import type { InviteUserDto } from './dto/invite-user.dto';
import type { ListUsersQueryDto } from './dto/list-users-query.dto';
import type { UpdateUserDto } from './dto/update-user.dto';
import { User } from './entities/user.entity';

const SORT_COLUMNS = { name: 'user.name', email: 'user.email', role: 'user.role', createdAt: 'user.createdAt' };

@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly userTokens: UserTokensService,
    private readonly refreshTokens: RefreshTokensService,
    private readonly mail: MailOutbox,
    private readonly config: ConfigService<AppConfig, true>,
    private readonly audit: AuditService,
  ) {}

  async list(query: ListUsersQueryDto): Promise<{ items: User[]; total: number }> {
    const builder = this.users.createQueryBuilder('user');
    if (query.q) {
      builder.where('(user.name ILIKE :q OR user.email ILIKE :q)', { q: likePattern(query.q) });
    }
    if (query.roles?.length) builder.andWhere('user.role IN (:...roles)', { roles: query.roles });
    const [items, total] = await builder
      .orderBy(SORT_COLUMNS[query.sort], query.order === 'desc' ? 'DESC' : 'ASC')
      .addOrderBy('user.id', 'ASC')
      .skip((query.page - 1) * query.pageSize)
      .take(query.pageSize)
      .getManyAndCount();
    return { items, total };
  }

  /** A user who may sign in: active and with a password set. */
  findActive(id: string): Promise<User | null> {
    return this.users.findOne({ where: { id, active: true, passwordHash: Not(IsNull()) } });
  }

  findByEmail(email: string): Promise<User | null> {
    return this.users
      .createQueryBuilder('user')
      .where('lower(user.email) = lower(:email)', { email: email.trim() })
      .getOne();
  }

  async get(id: string): Promise<User> {
    const user = await this.users.findOneBy({ id });
    if (!user) throw notFound('The user');
    return user;
  }

  async invite(actor: Actor, dto: InviteUserDto): Promise<User> {
    if (!canAssignRole(actor.role, dto.role)) {
      throw new DomainError('forbidden', `Your role may not invite a user as ${dto.role}.`);
    }
    if (await this.findByEmail(dto.email)) {
      throw new DomainError('conflict', 'That e-mail address already belongs to a user.', {
        email: ['That e-mail address already belongs to a user.'],
      });
    }
    const { user, secret } = await this.users.manager.transaction(async (manager) => {
      const created = await manager
        .getRepository(User)
        .save(
          manager.getRepository(User).create({ email: dto.email, name: dto.name, role: dto.role, passwordHash: null }),
        );
      await this.audit.record(
        {
          action: 'user-invited',
          actor,
          subject: { type: 'user', id: created.id },
          detail: { email: created.email, role: created.role },
        },
        manager,
      );
      return { user: created, secret: await this.userTokens.issue(created.id, 'invite', manager) };
    });
    await this.sendInvitation(actor, user, secret);
    return user;
  }

  async resendInvitation(actor: Actor, id: string): Promise<void> {
    const user = await this.get(id);
    this.assertMayManage(actor, user);
    if (user.passwordHash || !user.active) {
      throw new DomainError('conflict', 'Only a pending invitation can be sent again.');
    }
    await this.sendInvitation(actor, user, await this.userTokens.issue(user.id, 'invite'));
  }

  async update(actor: Actor, id: string, dto: UpdateUserDto): Promise<User> {
    const user = await this.get(id);
    this.assertMayManage(actor, user);
    if (actor.id === user.id && (dto.active === false || (dto.role && dto.role !== user.role))) {
      throw new DomainError('forbidden', 'You cannot change your own role or deactivate yourself.');
    }
    if (dto.role && !canAssignRole(actor.role, dto.role)) {
      throw new DomainError('forbidden', `Your role may not make a user ${dto.role}.`);
    }
    const before = { role: user.role, active: user.active };
    Object.assign(user, {
      name: dto.name ?? user.name,
      role: dto.role ?? user.role,
      active: dto.active ?? user.active,
    });
    const saved = await this.users.manager.transaction(async (manager) => {
      const changed = await manager.getRepository(User).save(user);
      const subject = { type: 'user' as const, id: user.id };
      if (changed.role !== before.role) {
        await this.audit.record(
          {
            action: 'role-changed',
            actor,
            subject,
            detail: { email: user.email, from: before.role, to: changed.role },
          },
          manager,
        );
      }
      if (changed.active !== before.active) {
        const action = changed.active ? 'user-reactivated' : 'user-deactivated';
        await this.audit.record({ action, actor, subject, detail: { email: user.email, role: changed.role } }, manager);
      }
      return changed;
    });
    if (dto.active === false) await this.refreshTokens.revokeAllFor(user.id);
    return saved;
  }

  async setPassword(userId: string, passwordHash: string, manager: EntityManager): Promise<void> {
    await manager.getRepository(User).update({ id: userId }, { passwordHash });
  }

  async recordSignIn(userId: string, manager: EntityManager = this.users.manager): Promise<void> {
    await manager.getRepository(User).update({ id: userId }, { lastSignInAt: new Date() });
  }

  /** Office runs the team but not the owners: only an owner changes an owner. */
  private assertMayManage(actor: Actor, target: User): void {
    if (!canAssignRole(actor.role, target.role)) {
      throw new DomainError('forbidden', 'Only an owner may change an owner.');
    }
  }

  private async sendInvitation(actor: Actor, user: User, secret: string): Promise<void> {
    const link = `${this.config.get('APP_URL', { infer: true })}/set-password?token=${secret}`;
    const key = `invitation:${randomUUID()}`;
    await this.mail.queue({
      ...invitationMail(user.email, user.name, actor.name, link),
      key,
      topic: 'account',
      refId: user.id,
    });
  }
}
