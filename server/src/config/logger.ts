import { RequestMethod } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import type { Params } from 'nestjs-pino';
import type { DestinationStream } from 'pino';
import type { Options } from 'pino-http';

const REQUEST_ID = /^[A-Za-z0-9-]{8,64}$/;

/**
 * Where a secret could sit in a logged object: credentials in headers (should a raw request or an HTTP client's error
 * ever be logged whole) and the fields of sign-in, password and token bodies. The request and response serializers
 * below already keep headers and bodies out; this is the net under them.
 */
export const REDACTED_PATHS = [
  'req.headers.authorization',
  'req.headers.cookie',
  'req.headers["stripe-signature"]',
  'res.headers["set-cookie"]',
  '*.headers.authorization',
  '*.headers.Authorization',
  // An HTTP client's error carries the request it made, credentials included.
  '*.config.headers.authorization',
  '*.config.headers.Authorization',
  '*.headers.cookie',
  '*.headers["set-cookie"]',
  '*.headers["stripe-signature"]',
  'password',
  '*.password',
  'accessToken',
  '*.accessToken',
  'refreshToken',
  '*.refreshToken',
  'token',
  '*.token',
  'secret',
  '*.secret',
  '*.apiKey',
  '*.stripeSignature',
];

/** The app's pino setup: one line per request, no headers or bodies, secrets censored; `destination` for tests. */
export function loggerParams(level: string, destination?: DestinationStream): Params {
  const options: Options = {
    level,
    redact: { paths: REDACTED_PATHS, censor: '[redacted]' },
    // Reuse a caller's request id when it looks like one, so a load balancer's id follows the request.
    genReqId: (req, res) => {
      const incoming = req.headers['x-request-id'];
      const id = typeof incoming === 'string' && REQUEST_ID.test(incoming) ? incoming : randomUUID();
      res.setHeader('x-request-id', id);
      return id;
    },
    // One line per request: who, what and how it went; headers stay out (they carry tokens and cookies).
    serializers: {
      req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
    autoLogging: { ignore: (req) => req.url === '/api/health' },
  };
  return {
    forRoutes: [{ path: '{*path}', method: RequestMethod.ALL }],
    pinoHttp: destination ? [options, destination] : options,
  };
}
