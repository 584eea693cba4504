import { ArgumentsHost, Catch, type ExceptionFilter, HttpStatus, Logger } from '@nestjs/common';
import type { Request, Response } from 'express';
import { DomainError } from '../common/errors/domain-error';
import type { ErrorBody } from '../common/filters/all-exceptions.filter';
import type { PublicDayDto } from './dto/booking-response.dto';

/** The route day has too few bench minutes left; carries the next day of the stop that would fit, if any. */
export class DayFullError extends DomainError {
  constructor(
    message: string,
    fields: Record<string, string[]>,
    readonly nextDay: PublicDayDto | null,
  ) {
    super('conflict', message, fields);
    this.name = 'DayFullError';
  }
}

/** The usual error body plus `code` and `nextDay`, so the booking page can offer the day that fits in one click. */
export interface DayFullBody extends ErrorBody {
  code: 'conflict';
  nextDay: PublicDayDto | null;
}

@Catch(DayFullError)
export class DayFullFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: DayFullError, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const request = http.getRequest<Request & { id?: string }>();
    const body: DayFullBody = {
      statusCode: HttpStatus.CONFLICT,
      error: 'Conflict',
      code: 'conflict',
      message: exception.message,
      fields: exception.fields,
      nextDay: exception.nextDay,
      requestId: request.id === undefined ? undefined : String(request.id),
    };
    this.logger.warn({ requestId: body.requestId, url: request.originalUrl, status: 409 }, 'booking refused: day full');
    const response = http.getResponse<Response>();
    if (!response.headersSent) response.status(HttpStatus.CONFLICT).json(body);
  }
}
