import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import { isRuleError } from '@keenroute/shared';
import type { Request, Response } from 'express';
import { DomainError } from '../errors/domain-error';
import { httpStatusFor } from '../errors/http-status-for';

export interface ErrorBody {
  statusCode: number;
  error: string;
  message: string;
  fields?: Record<string, string[]>;
  requestId?: string;
}

/** Every error leaves as one JSON shape; stack traces and SQL stay in the log, keyed by the request id. */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const request = http.getRequest<Request & { id?: string }>();
    const response = http.getResponse<Response>();
    const requestId = request.id === undefined ? undefined : String(request.id);
    const body = this.toBody(exception);
    body.requestId = requestId;

    const context = { requestId, method: request.method, url: request.originalUrl, status: body.statusCode };
    if (body.statusCode >= 500) {
      this.logger.error({ ...context, err: exception }, 'request failed');
    } else {
      this.logger.warn({ ...context, message: body.message }, 'request refused');
    }
    if (!response.headersSent) response.status(body.statusCode).json(body);
  }

  private toBody(exception: unknown): ErrorBody {
    if (exception instanceof DomainError) {
      const statusCode = httpStatusFor(exception.code);
      return { statusCode, error: reason(statusCode), message: exception.message, fields: exception.fields };
    }
    if (isRuleError(exception)) {
      // A trade rule refused the input: the person can fix it, so it is a 400 on the field the rule names.
      const fields = exception.field ? { [exception.field]: [exception.message] } : undefined;
      return { statusCode: HttpStatus.BAD_REQUEST, error: reason(400), message: exception.message, fields };
    }
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const raw = exception.getResponse();
      const payload = typeof raw === 'string' ? { message: raw } : (raw as Record<string, unknown>);
      const message = Array.isArray(payload.message)
        ? payload.message.join('; ')
        : typeof payload.message === 'string'
          ? payload.message
          : reason(statusCode);
      const fields = payload.fields as Record<string, string[]> | undefined;
      return { statusCode, error: reason(statusCode), message, fields };
    }
    const client = clientHttpError(exception);
    if (client) return { statusCode: client.status, error: reason(client.status), message: client.message };
    if (isUnstorableText(exception)) {
      // The validation pipe refuses NUL and broken Unicode; this catches text that reached the database another way.
      return { statusCode: HttpStatus.BAD_REQUEST, error: reason(400), message: 'Text cannot contain NUL characters.' };
    }
    if (isDatabaseUnavailable(exception)) {
      return {
        statusCode: HttpStatus.SERVICE_UNAVAILABLE,
        error: reason(HttpStatus.SERVICE_UNAVAILABLE),
        message: 'The database is not reachable right now. Try again in a moment.',
      };
    }
    return {
      statusCode: HttpStatus.INTERNAL_SERVER_ERROR,
      error: reason(HttpStatus.INTERNAL_SERVER_ERROR),
      message: 'Something went wrong on our side. It has been logged.',
    };
  }
}

function reason(status: number): string {
  const name = HttpStatus[status];
  return typeof name === 'string'
    ? name
        .toLowerCase()
        .split('_')
        .map((word) => word[0]!.toUpperCase() + word.slice(1))
        .join(' ')
    : 'Error';
}

const CLIENT_MESSAGES: Partial<Record<number, string>> = {
  [HttpStatus.PAYLOAD_TOO_LARGE]: 'The request is too large.',
  [HttpStatus.UNSUPPORTED_MEDIA_TYPE]: 'This content type is not accepted here.',
};

/** Errors Express middleware raises the http-errors way (body-parser's 413 above all): a 4xx the caller can fix. */
function clientHttpError(exception: unknown): { status: number; message: string } | undefined {
  if (typeof exception !== 'object' || exception === null) return undefined;
  const { status, expose, message } = exception as { status?: unknown; expose?: unknown; message?: unknown };
  if (typeof status !== 'number' || status < 400 || status > 499 || expose !== true) return undefined;
  return { status, message: CLIENT_MESSAGES[status] ?? (typeof message === 'string' ? message : reason(status)) };
}

/** PostgreSQL refusing text it cannot store: NUL characters (22021) or bytes with no place in the encoding (22P05). */
function isUnstorableText(exception: unknown): boolean {
  // TypeORM's QueryFailedError copies the driver's fields, code included, onto itself.
  const code = (exception as { code?: unknown } | null)?.code;
  return code === '22021' || code === '22P05';
}

const UNAVAILABLE = new Set(['ECONNREFUSED', 'ECONNRESET', '57P01', '57P03', 'ETIMEDOUT']);

function isDatabaseUnavailable(exception: unknown): boolean {
  if (typeof exception !== 'object' || exception === null) return false;
  const { code, message, name } = exception as { code?: unknown; message?: unknown; name?: unknown };
  return (
    (typeof code === 'string' && UNAVAILABLE.has(code)) ||
    // TypeORM lets go of a transaction's connection that PostgreSQL ended; the transaction's next query throws this.
    name === 'QueryRunnerAlreadyReleasedError' ||
    (typeof message === 'string' && /Connection terminated|timeout exceeded when trying to connect/.test(message))
  );
}
