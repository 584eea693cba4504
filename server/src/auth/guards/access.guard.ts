import { ExecutionContext, ForbiddenException, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import type { Role } from '@keenroute/shared';
import type { Request } from 'express';
import type { Actor } from '../actor';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator';
import { ROLES_KEY } from '../decorators/roles.decorator';

/** The one global guard: open routes say @Public(), every other route must list its roles or nobody gets in. */
@Injectable()
export class AccessGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, targets)) return true;

    await super.canActivate(context);
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    const actor = context.switchToHttp().getRequest<Request & { user: Actor }>().user;
    if (!roles || !roles.includes(actor.role)) {
      throw new ForbiddenException('Your role may not do this.');
    }
    return true;
  }

  override handleRequest<T>(error: unknown, user: T | false): T {
    // A token passport-jwt refuses arrives as `info`, not `error`; an error is the user look-up failing (the database
    // down), which must stay a 503 instead of a 401 that would send everyone to sign in again.
    if (error instanceof Error) throw error;
    if (error || !user) throw new UnauthorizedException('Sign in to continue.');
    return user;
  }
}
