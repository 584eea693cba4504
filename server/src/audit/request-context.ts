import { Injectable, type NestMiddleware } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { AsyncLocalStorage } from 'node:async_hooks';
import { isIP } from 'node:net';

interface RequestContext {
  ip: string | null;
}

const storage = new AsyncLocalStorage<RequestContext>();

/** The caller's address for the audit log, without passing the request through every service. */
export function requestIp(): string | null {
  return storage.getStore()?.ip ?? null;
}

/** Runs the rest of the request inside its context. req.ip honours the app's trust-proxy setting. */
@Injectable()
export class RequestContextMiddleware implements NestMiddleware {
  use(req: Request, _res: Response, next: NextFunction): void {
    // Only a well-formed address goes in: the column is inet, and a bad value must not fail the change it records.
    const ip = req.ip && isIP(req.ip) ? req.ip : null;
    storage.run({ ip }, next);
  }
}
