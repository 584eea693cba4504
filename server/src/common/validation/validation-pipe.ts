import { BadRequestException, ValidationError, ValidationPipe } from '@nestjs/common';

/** Flattens class-validator's tree into `{ "address.city": ["..."] }` so forms can show messages per field. */
export function fieldMessages(errors: ValidationError[], prefix = ''): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const error of errors) {
    const path = prefix ? `${prefix}.${error.property}` : error.property;
    if (error.constraints) fields[path] = Object.values(error.constraints);
    if (error.children?.length) Object.assign(fields, fieldMessages(error.children, path));
  }
  return fields;
}

export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) =>
      new BadRequestException({ message: 'Some fields need attention.', fields: fieldMessages(errors) }),
  });
}
