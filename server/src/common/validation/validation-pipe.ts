import { ArgumentMetadata, BadRequestException, ValidationError, ValidationPipe } from '@nestjs/common';
import { unsafeInput } from './unsafe-input';

const MESSAGE = 'Some fields need attention.';
const PLAIN_TYPES = new Set<unknown>([Object, Array, String, Number, Boolean]);

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

/**
 * class-validator's pipe, after two checks no DTO can make for itself: text every layer below can store (see
 * unsafe-input.ts) in bodies, queries and path values alike, and a body that is one object, not a list of them.
 */
class KeenrouteValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    if (metadata.type !== 'custom') {
      const fields = unsafeInput(value, metadata.data ?? '');
      if (Object.keys(fields).length > 0) throw new BadRequestException({ message: MESSAGE, fields });
    }
    if (metadata.type === 'body' && Array.isArray(value) && metadata.metatype && !PLAIN_TYPES.has(metadata.metatype)) {
      throw new BadRequestException({ message: 'Send the fields as one JSON object, not a list.' });
    }
    return super.transform(value, metadata);
  }
}

export function createValidationPipe(): ValidationPipe {
  return new KeenrouteValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => new BadRequestException({ message: MESSAGE, fields: fieldMessages(errors) }),
  });
}
