import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import type { AppConfig } from '../../../src/config/environment';
import { JWT_ALGORITHM, JWT_AUDIENCE, JWT_ISSUER } from '../../../src/auth/jwt.constants';

const base64url = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');

/**
 * Bearer tokens that name a real user but must not get in: each breaks one thing the JWT strategy pins (the secret, the
 * expiry, the audience, the algorithm).
 */
export function forgedTokens(app: INestApplication, userId: string): Record<string, string> {
  const secret = app.get<ConfigService<AppConfig, true>>(ConfigService).get('JWT_SECRET', { infer: true });
  const jwt = new JwtService();
  const claims = { sub: userId, role: 'owner' };
  const pinned = { algorithm: JWT_ALGORITHM, issuer: JWT_ISSUER, audience: JWT_AUDIENCE } as const;
  const now = Math.floor(Date.now() / 1000);
  return {
    'another secret': jwt.sign(claims, { ...pinned, secret: `${secret}-not-ours`, expiresIn: 600 }),
    expired: jwt.sign({ ...claims, iat: now - 7200, exp: now - 3600 }, { ...pinned, secret }),
    'another audience': jwt.sign(claims, { ...pinned, audience: 'some-other-api', secret, expiresIn: 600 }),
    'alg none': `${base64url({ alg: 'none', typ: 'JWT' })}.${base64url({
      ...claims,
      iss: JWT_ISSUER,
      aud: JWT_AUDIENCE,
      exp: now + 600,
    })}.`,
  };
}
