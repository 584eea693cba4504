import { Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { Request } from 'express';

/** Counts sign-in attempts per address and e-mail, so one person's typos do not lock out a whole salon's Wi-Fi. */
@Injectable()
export class AuthThrottlerGuard extends ThrottlerGuard {
  protected override getTracker(request: Record<string, unknown>): Promise<string> {
    const req = request as unknown as Request;
    const body = (req.body ?? {}) as { email?: unknown };
    const email = typeof body.email === 'string' ? body.email.trim().toLowerCase() : '';
    return Promise.resolve(`${req.ip ?? 'unknown'}|${email}`);
  }
}
