import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { createSecretKey } from 'node:crypto';
import { ExtractJwt, Strategy } from 'passport-jwt';
import type { AppConfig } from '../config/environment';
import { UsersService } from '../users/users.service';
import type { Actor } from './actor';
import { JWT_ALGORITHM, JWT_AUDIENCE, JWT_ISSUER } from './jwt.constants';

interface AccessClaims {
  sub: string;
}

/**
 * The secret as a KeyObject. Given a string or Buffer, jsonwebtoken first tries to read it as a PEM public key and
 * catches the failure, on every request; a KeyObject skips that. passport-jwt hands the key to jsonwebtoken as it is,
 * though its types list only string | Buffer.
 */
function verificationKey(secret: string): Buffer {
  return createSecretKey(Buffer.from(secret, 'utf8')) as unknown as Buffer;
}

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    config: ConfigService<AppConfig, true>,
    private readonly users: UsersService,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: verificationKey(config.get('JWT_SECRET', { infer: true })),
      algorithms: [JWT_ALGORITHM],
      issuer: JWT_ISSUER,
      audience: JWT_AUDIENCE,
      ignoreExpiration: false,
    });
  }

  /** Re-reads the user so a deactivation or role change takes effect before the token expires. */
  async validate(claims: AccessClaims): Promise<Actor | false> {
    const user = await this.users.findActive(claims.sub);
    return user ? { id: user.id, email: user.email, name: user.name, role: user.role } : false;
  }
}
