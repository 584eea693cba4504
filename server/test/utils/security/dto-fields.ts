/**
 * What a DTO accepts, read from its class-validator (and class-transformer @Type) metadata, so bad input can be made
 * for every field of every DTO without a hand-written list that would go stale.
 */
import type { Type } from '@nestjs/common';
import { getMetadataStorage, ValidationTypes } from 'class-validator';
import type { ValidationMetadata } from 'class-validator/types/metadata/ValidationMetadata';

// class-transformer keeps @Type() in a storage it does not export from its entry point; its types sit apart.
const { defaultMetadataStorage } = module.require(
  'class-transformer/cjs/storage',
) as typeof import('class-transformer/types/storage');

export type FieldKind = 'string' | 'number' | 'boolean' | 'array' | 'object' | 'nested' | 'nested-array' | 'unknown';

export interface DtoField {
  /** Path as the validation pipe reports it: "name", "customer.name", "items.0.count". */
  path: string;
  /** The same path as keys to build a body with. */
  keys: (string | number)[];
  kind: FieldKind;
  /** No @IsOptional() and no @ValidateIf(): leaving it out must be refused. */
  required: boolean;
  /** Validator names on the field: isString, maxLength, isUUID, ... */
  validators: string[];
}

const NUMBER = new Set(['isInt', 'isNumber', 'isPositive', 'isNegative', 'min', 'max', 'isDivisibleBy']);
const STRING = new Set([
  'isString',
  'isEmail',
  'isUUID',
  'length',
  'maxLength',
  'minLength',
  'matches',
  'isDateString',
  'isISO8601',
  'isCalendarDate',
  'isUrl',
  'isHexColor',
]);
/** Validators that accept a field left out (a coordinate may be, together with its partner). */
const ABSENT_OK = new Set(['isCoordinate']);
const ARRAY = new Set(['isArray', 'arrayMaxSize', 'arrayMinSize', 'arrayUnique', 'arrayNotEmpty']);

function kindOf(dto: Type, property: string, metas: ValidationMetadata[]): FieldKind {
  const names = new Set(metas.map((meta) => meta.name ?? meta.type));
  const designType = Reflect.getMetadata('design:type', dto.prototype, property) as unknown;
  if (metas.some((meta) => meta.type === ValidationTypes.NESTED_VALIDATION)) {
    return designType === Array || metas.some((meta) => meta.each) ? 'nested-array' : 'nested';
  }
  if ([...names].some((name) => ARRAY.has(name)) || designType === Array) return 'array';
  if (names.has('isBoolean')) return 'boolean';
  if ([...names].some((name) => NUMBER.has(name))) return 'number';
  if ([...names].some((name) => STRING.has(name))) return 'string';
  if (names.has('isIn')) {
    const allowed = metas.find((meta) => meta.name === 'isIn')?.constraints?.[0] as unknown[] | undefined;
    return allowed?.every((value) => typeof value === 'string') ? 'string' : 'unknown';
  }
  if (names.has('isObject')) return 'object';
  if (designType === String) return 'string';
  if (designType === Number) return 'number';
  if (designType === Boolean) return 'boolean';
  return 'unknown';
}

function nestedClass(dto: Type, property: string): Type | undefined {
  const typeMeta = defaultMetadataStorage.findTypeMetadata(dto, property);
  return typeMeta?.typeFunction() as Type | undefined;
}

/** Every field of a DTO, nested DTOs (and the first item of nested arrays) included. */
export function dtoFields(dto: Type, prefix: (string | number)[] = [], depth = 0): DtoField[] {
  const metas = getMetadataStorage().getTargetValidationMetadatas(dto, '', true, false);
  const byProperty = new Map<string, ValidationMetadata[]>();
  for (const meta of metas) byProperty.set(meta.propertyName, [...(byProperty.get(meta.propertyName) ?? []), meta]);

  const fields: DtoField[] = [];
  for (const [property, own] of byProperty) {
    const keys = [...prefix, property];
    const kind = kindOf(dto, property, own);
    const validators = own.map((meta) => meta.name ?? meta.type);
    const required =
      !own.some((meta) => meta.type === ValidationTypes.CONDITIONAL_VALIDATION) &&
      !validators.some((name) => ABSENT_OK.has(name));
    fields.push({ path: keys.join('.'), keys, kind, required, validators });
    const inner = kind === 'nested' || kind === 'nested-array' ? nestedClass(dto, property) : undefined;
    if (inner && depth < 3) fields.push(...dtoFields(inner, kind === 'nested-array' ? [...keys, 0] : keys, depth + 1));
  }
  return fields;
}

/** A body with `value` at the field's place: { customer: { name: value } }, { items: [{ count: value }] }. */
export function bodyWith(keys: readonly (string | number)[], value: unknown): Record<string, unknown> {
  const [head, ...rest] = keys;
  if (rest.length === 0) return { [head!]: value };
  const inner = typeof rest[0] === 'number' ? [bodyWith(rest.slice(1), value)] : bodyWith(rest, value);
  return { [head!]: inner };
}

/** Free text: a string field no format pins down (no id, choice, date, e-mail or pattern). */
export const isFreeText = (field: DtoField) =>
  field.kind === 'string' &&
  !field.validators.some((name) =>
    ['isUUID', 'isIn', 'isEmail', 'isDateString', 'isISO8601', 'isCalendarDate', 'isUrl', 'equals'].includes(name),
  );
