/** Codes of the errors services raise; the exception filter maps each to an HTTP status. */
export const DOMAIN_ERROR_CODES = [
  'not_found',
  'conflict',
  'forbidden',
  'invalid_credentials',
  'invalid_token',
  'invalid_input',
] as const;
export type DomainErrorCode = (typeof DOMAIN_ERROR_CODES)[number];

/** A business rule said no. The message is written for the person using Keenroute. */
export class DomainError extends Error {
  constructor(
    readonly code: DomainErrorCode,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
    this.name = 'DomainError';
  }
}

export const notFound = (what: string) => new DomainError('not_found', `${what} was not found.`);
