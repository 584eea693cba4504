import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, IsNull, MoreThan, Repository } from 'typeorm';
import { DomainError } from '../common/errors/domain-error';
import { UserToken, UserTokenPurpose } from './entities/user-token.entity';
import { INVITE_HOURS, RESET_HOURS } from './jwt.constants';
import { hashSecret, newSecret } from './token-hash';

const HOURS: Record<UserTokenPurpose, number> = { invite: INVITE_HOURS, reset: RESET_HOURS };

export const expiredLink = () =>
  new DomainError('invalid_token', 'This link has expired or was already used. Ask for a new one.');

/** Single-use links for invitations and password resets. */
@Injectable()
export class UserTokensService {
  constructor(@InjectRepository(UserToken) private readonly tokens: Repository<UserToken>) {}

  /** Issues a new link and retires any earlier unused link of the same purpose, so only the newest works. */
  async issue(userId: string, purpose: UserTokenPurpose, manager?: EntityManager): Promise<string> {
    const repo = manager ? manager.getRepository(UserToken) : this.tokens;
    const now = new Date();
    await repo.update({ userId, purpose, usedAt: IsNull() }, { usedAt: now });
    const { secret, hash } = newSecret();
    await repo.insert({
      userId,
      purpose,
      tokenHash: hash,
      expiresAt: new Date(now.getTime() + HOURS[purpose] * 3600 * 1000),
      usedAt: null,
    });
    return secret;
  }

  /** A live (unused, unexpired) token with its user, or one not-found error for every kind of bad link. */
  async findLive(secret: string): Promise<UserToken & { user: NonNullable<UserToken['user']> }> {
    const token = await this.tokens.findOne({
      where: { tokenHash: hashSecret(secret), usedAt: IsNull(), expiresAt: MoreThan(new Date()) },
      relations: { user: true },
    });
    if (!token?.user) throw expiredLink();
    return token as UserToken & { user: NonNullable<UserToken['user']> };
  }

  /** Spends a live token in one conditional UPDATE, so two requests racing with the same link cannot both win. */
  async consume(secret: string, manager: EntityManager): Promise<UserToken> {
    const result = await manager
      .createQueryBuilder()
      .update(UserToken)
      .set({ usedAt: () => 'now()' })
      .where('token_hash = :hash AND used_at IS NULL AND expires_at > now()', { hash: hashSecret(secret) })
      .returning('id, user_id, purpose')
      .execute();
    const row = (result.raw as Array<{ id: string; user_id: string; purpose: UserToken['purpose'] }>)[0];
    if (!row) throw expiredLink();
    return Object.assign(new UserToken(), { id: row.id, userId: row.user_id, purpose: row.purpose });
  }
}
