import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { compare, hash } from 'bcryptjs';
import { DataSource } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { DomainError } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import { MailOutbox } from '../mail/mail-outbox';
import { passwordResetMail } from '../mail/templates/account-links';
import { toUserSummary } from '../users/dto/user-response.dto';
import type { User } from '../users/entities/user.entity';
import { UsersService } from '../users/users.service';
import type { LinkInfoDto, SessionDto } from './dto/session.dto';
import { BCRYPT_COST } from './jwt.constants';
import { passwordProblem } from './password-policy';
import { RefreshTokensService } from './refresh-tokens.service';
import { UserTokensService } from './user-tokens.service';

export interface SignedIn {
  session: SessionDto;
  refreshToken: string;
}

const wrongCredentials = () => new DomainError('invalid_credentials', 'Wrong e-mail or password.');

// Compared against when the e-mail is unknown, so both failures take the same time.
const DUMMY_HASH = '$2b$12$MDONJJCGFidpWsiRw7JOf.lSLYk0cKMOvKCNKHiZwWGo/pcUWkZMy';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly refreshTokens: RefreshTokensService,
    private readonly userTokens: UserTokensService,
    private readonly jwt: JwtService,
    private readonly mail: MailOutbox,
    private readonly dataSource: DataSource,
    private readonly config: ConfigService<AppConfig, true>,
    private readonly audit: AuditService,
  ) {}

  async login(email: string, password: string): Promise<SignedIn> {
    const user = await this.users.findByEmail(email);
    const matches = await compare(password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !user.passwordHash || !user.active || !matches) {
      const reason = !user
        ? 'unknown-email'
        : !user.passwordHash
          ? 'no-password'
          : !user.active
            ? 'deactivated'
            : 'wrong-password';
      // The e-mail as typed and why, for the owner; the caller hears only "wrong e-mail or password".
      await this.audit.record({
        action: 'sign-in-failed',
        actor: { id: null, email },
        subject: { type: 'user', id: user?.id ?? null },
        detail: { reason },
      });
      throw wrongCredentials();
    }
    await this.recordSignIn(user, 'password');
    return this.signIn(user);
  }

  async refresh(refreshToken: string | undefined): Promise<SignedIn> {
    if (!refreshToken) throw new DomainError('invalid_credentials', 'Sign in to continue.');
    const { userId, next } = await this.refreshTokens.rotate(refreshToken);
    const user = await this.users.findActive(userId);
    if (!user) {
      await this.refreshTokens.revokeAllFor(userId);
      throw new DomainError('invalid_credentials', 'Your session has ended. Sign in again.');
    }
    return { session: this.session(user), refreshToken: next };
  }

  async logout(refreshToken: string | undefined): Promise<void> {
    if (refreshToken) await this.refreshTokens.revoke(refreshToken);
  }

  async describeLink(secret: string): Promise<LinkInfoDto> {
    const token = await this.userTokens.findLive(secret);
    return { purpose: token.purpose, email: token.user.email, name: token.user.name };
  }

  /** Sets the password from an invitation or reset link, spends the link, and signs the person in. */
  async setPassword(secret: string, password: string): Promise<SignedIn> {
    const preview = await this.userTokens.findLive(secret);
    const problem = passwordProblem(password, preview.user.email);
    if (problem) throw new DomainError('invalid_input', problem, { password: [problem] });
    const passwordHash = await hash(password, BCRYPT_COST);

    const userId = await this.dataSource.transaction(async (manager) => {
      const token = await this.userTokens.consume(secret, manager);
      await this.users.setPassword(token.userId, passwordHash, manager);
      return token.userId;
    });
    // A new password ends every other session of this user.
    await this.refreshTokens.revokeAllFor(userId);
    const user = await this.users.findActive(userId);
    if (!user) throw new DomainError('forbidden', 'This account is deactivated. Ask the office to reactivate it.');
    await this.recordSignIn(user, 'password-link');
    return this.signIn(user);
  }

  /** Always answers the same way, so the form cannot be used to learn who has an account. */
  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.users.findByEmail(email);
    if (!user || !user.active || !user.passwordHash) return;
    const secret = await this.userTokens.issue(user.id, 'reset');
    const link = `${this.config.get('APP_URL', { infer: true })}/set-password?token=${secret}`;
    // Each request is a message of its own with a new link; the key never holds the secret.
    const key = `password-reset:${randomUUID()}`;
    await this.mail.queue({ ...passwordResetMail(user.email, user.name, link), key, topic: 'account', refId: user.id });
  }

  private recordSignIn(user: User, via: 'password' | 'password-link'): Promise<void> {
    return this.dataSource.transaction(async (manager) => {
      await this.users.recordSignIn(user.id, manager);
      await this.audit.record(
        { action: 'sign-in', actor: user, subject: { type: 'user', id: user.id }, detail: { via, role: user.role } },
        manager,
      );
    });
  }

  private async signIn(user: User): Promise<SignedIn> {
    return { session: this.session(user), refreshToken: await this.refreshTokens.issue(user.id) };
  }

  private session(user: User): SessionDto {
    return { accessToken: this.jwt.sign({ sub: user.id, role: user.role }), user: toUserSummary(user) };
  }
}
