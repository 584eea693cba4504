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

const UNAVAILABLE = new Set(['ECONNREFUSED', 'ECONNRESET', '57P01', '57P03', 'ETIMEDOUT']);

function isDatabaseUnavailable(exception: unknown): boolean {
  if (typeof exception !== 'object' || exception === null) return false;
  const code = (exception as { code?: unknown }).code;
  const message = (exception as { message?: unknown }).message;
  return (
    (typeof code === 'string' && UNAVAILABLE.has(code)) ||
    (typeof message === 'string' && /Connection terminated|timeout exceeded when trying to connect/.test(message))
  );
}
