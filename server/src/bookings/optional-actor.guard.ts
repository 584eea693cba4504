import { Injectable } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';
import type { Actor } from '../auth/actor';

/** On an open route: reads the caller's token when there is a valid one, and lets everyone else through unsigned. */
@Injectable()
export class OptionalActorGuard extends AuthGuard('jwt') {
  override handleRequest<T = Actor>(_error: unknown, user: T | false): T {
    return (user || null) as T;
  }
}
