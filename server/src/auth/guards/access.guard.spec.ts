import { ExecutionContext, ForbiddenException, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import type { Role } from '@keenroute/shared';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator';
import { ROLES_KEY } from '../decorators/roles.decorator';
import { AccessGuard } from './access.guard';

function contextFor(metadata: Record<string, unknown>, role: Role): ExecutionContext {
  const handler = () => undefined;
  for (const [key, value] of Object.entries(metadata)) Reflect.defineMetadata(key, value, handler);
  return {
    getHandler: () => handler,
    getClass: () => class {},
    switchToHttp: () => ({ getRequest: () => ({ user: { id: 'u1', role } }) }),
  } as unknown as ExecutionContext;
}

describe('AccessGuard', () => {
  let sut: AccessGuard;

  beforeEach(() => {
    sut = new AccessGuard(new Reflector());
    // The JWT check itself is passport's; here we test what the guard decides after it.
    jest.spyOn(AuthGuard('jwt').prototype, 'canActivate').mockResolvedValue(true);
  });
  afterEach(() => jest.restoreAllMocks());

  it('lets anyone through a @Public() route without checking a token', async () => {
    const passport = jest.spyOn(AuthGuard('jwt').prototype, 'canActivate');
    await expect(sut.canActivate(contextFor({ [IS_PUBLIC_KEY]: true }, 'client'))).resolves.toBe(true);
    expect(passport).not.toHaveBeenCalled();
  });

  it('admits a listed role', async () => {
    await expect(sut.canActivate(contextFor({ [ROLES_KEY]: ['owner', 'office'] }, 'office'))).resolves.toBe(true);
  });

  it('refuses a role that is not listed', async () => {
    await expect(sut.canActivate(contextFor({ [ROLES_KEY]: ['owner'] }, 'sharpener'))).rejects.toBeInstanceOf(
      ForbiddenException,
    );
  });

  it('refuses everyone on a route that declares no roles', async () => {
    await expect(sut.canActivate(contextFor({}, 'owner'))).rejects.toBeInstanceOf(ForbiddenException);
  });

  it('answers 401 for no user, but lets a failed user look-up (the database down) through as itself', () => {
    expect(() => sut.handleRequest(null, false)).toThrow(UnauthorizedException);
    const down = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' });
    expect(() => sut.handleRequest(down, false)).toThrow(down);
  });
});
