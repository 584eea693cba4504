import { registerDecorator, type ValidationArguments, type ValidationOptions } from 'class-validator';

/** Trims text; other values pass through for the validators to judge. */
export const trimmed = ({ value }: { value: unknown }): unknown => (typeof value === 'string' ? value.trim() : value);

/** Trims text and reads null as cleared (''), for text columns that are never null. */
export const trimmedOrEmpty = ({ value }: { value: unknown }): unknown => (value === null ? '' : trimmed({ value }));

/** Trims text and reads an empty field as "none" (null), as a cleared form input means. */
export const trimmedOrNull = ({ value }: { value: unknown }): unknown => {
  const text = trimmed({ value });
  return text === '' ? null : text;
};

/** "YYYY-MM-DD" naming a real calendar day. */
export function isCalendarDate(value: unknown): value is string {
  if (typeof value !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(value)) return false;
  const [y, m, d] = value.split('-').map(Number) as [number, number, number];
  return new Date(Date.UTC(y, m - 1, d)).toISOString().slice(0, 10) === value;
}

export function IsCalendarDate(options?: ValidationOptions) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isCalendarDate',
      target: object.constructor,
      propertyName,
      options,
      validator: { validate: (value: unknown) => isCalendarDate(value) },
    });
}

type Axis = 'latitude' | 'longitude';
const LIMIT: Record<Axis, number> = { latitude: 90, longitude: 180 };
const presence = (value: unknown) => (value === undefined ? 'absent' : value === null ? 'null' : 'value');

/** A latitude or longitude in range, given (or left out, or cleared with null) together with its partner. */
export function IsCoordinate(axis: Axis) {
  const partner: Axis = axis === 'latitude' ? 'longitude' : 'latitude';
  const paired = (args: ValidationArguments) =>
    presence(args.value) === presence((args.object as Record<string, unknown>)[partner]);
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isCoordinate',
      target: object.constructor,
      propertyName,
      validator: {
        validate: (value: unknown, args: ValidationArguments) =>
          paired(args) &&
          (value == null || (typeof value === 'number' && Number.isFinite(value) && Math.abs(value) <= LIMIT[axis])),
        defaultMessage: (args: ValidationArguments) =>
          paired(args)
            ? `${axis === 'latitude' ? 'Latitude' : 'Longitude'} is a number from -${LIMIT[axis]} to ${LIMIT[axis]}.`
            : 'Give latitude and longitude together, or neither.',
      },
    });
}
