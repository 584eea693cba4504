import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { IsNull, Repository } from 'typeorm';
import { DomainError } from '../common/errors/domain-error';
import { RefreshToken } from './entities/refresh-token.entity';
import { REFRESH_TOKEN_DAYS } from './jwt.constants';
import { hashSecret, newSecret } from './token-hash';

const invalidSession = () => new DomainError('invalid_credentials', 'Your session has ended. Sign in again.');

@Injectable()
export class RefreshTokensService {
  constructor(@InjectRepository(RefreshToken) private readonly tokens: Repository<RefreshToken>) {}

  async issue(userId: string, familyId: string = randomUUID()): Promise<string> {
    const { secret, hash } = newSecret();
    await this.tokens.insert({
      userId,
      familyId,
      tokenHash: hash,
      expiresAt: new Date(Date.now() + REFRESH_TOKEN_DAYS * 24 * 3600 * 1000),
      revokedAt: null,
    });
    return secret;
  }

  /**
   * Spends a refresh token and returns the user it belongs to with its successor. A token that was already spent
   * means it was copied: the whole family is revoked and the caller must sign in again.
   */
  async rotate(secret: string): Promise<{ userId: string; next: string }> {
    const hash = hashSecret(secret);
    const spent = await this.tokens.manager.transaction(async (manager) => {
      const repo = manager.getRepository(RefreshToken);
      const token = await repo.findOne({ where: { tokenHash: hash }, lock: { mode: 'pessimistic_write' } });
      if (!token) throw invalidSession();
      if (token.revokedAt) {
        await repo.update({ familyId: token.familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
        return null;
      }
      if (token.expiresAt.getTime() <= Date.now()) throw invalidSession();
      await repo.update({ id: token.id }, { revokedAt: new Date() });
      return token;
    });
    if (!spent) throw invalidSession();
    return { userId: spent.userId, next: await this.issue(spent.userId, spent.familyId) };
  }

  async revoke(secret: string): Promise<void> {
    await this.tokens.update({ tokenHash: hashSecret(secret), revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  async revokeAllFor(userId: string): Promise<void> {
    await this.tokens.update({ userId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }
}
