import { HttpStatus } from '@nestjs/common';
import type { DomainErrorCode } from './domain-error';

export function httpStatusFor(code: DomainErrorCode): HttpStatus {
  switch (code) {
    case 'not_found':
      return HttpStatus.NOT_FOUND;
    case 'conflict':
      return HttpStatus.CONFLICT;
    case 'forbidden':
      return HttpStatus.FORBIDDEN;
    case 'invalid_credentials':
      return HttpStatus.UNAUTHORIZED;
    case 'invalid_token':
      return HttpStatus.NOT_FOUND;
    case 'invalid_input':
      return HttpStatus.BAD_REQUEST;
    default: {
      const unhandled: never = code;
      throw new Error(`No HTTP status for domain error code ${String(unhandled)}`);
    }
  }
}
