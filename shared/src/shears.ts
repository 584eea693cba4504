import { RuleError, shown } from './errors.js';
import { LENGTH_MAX_IN, LENGTH_MIN_IN, LENGTH_STEP_IN } from './limits.js';

/** Edge types of hair and grooming shears (trade terms). Micro-serrated counts as serrated. */
export const EDGE_TYPES = ['beveled', 'convex', 'semi-convex', 'serrated'] as const;
export type EdgeType = (typeof EDGE_TYPES)[number];

/** Tool kinds (trade terms). */
export const TOOL_KINDS = ['straight', 'curved', 'thinning', 'blending', 'chunker'] as const;
export type ToolKind = (typeof TOOL_KINDS)[number];

export const HANDEDNESS = ['right', 'left'] as const;
export type Handedness = (typeof HANDEDNESS)[number];

/** What the shear cuts: human hair (salons, barbers) or animal coats (grooming shops). */
export const SHEAR_USES = ['hair', 'grooming'] as const;
export type ShearUse = (typeof SHEAR_USES)[number];

/** Tool kinds with one toothed blade: the straight blade is sharpened, the teeth are not ground. */
export const TOOTHED_TOOL_KINDS = ['thinning', 'blending', 'chunker'] as const satisfies readonly ToolKind[];
export type ToothedToolKind = (typeof TOOTHED_TOOL_KINDS)[number];

export const EDGE_TYPE_LABELS: Readonly<Record<EdgeType, string>> = {
  beveled: 'beveled',
  convex: 'convex',
  'semi-convex': 'semi-convex',
  serrated: 'serrated',
};

export const TOOL_KIND_LABELS: Readonly<Record<ToolKind, string>> = {
  straight: 'straight shear',
  curved: 'curved shear',
  thinning: 'thinning shear',
  blending: 'blending shear',
  chunker: 'chunker',
};

/** One pair of shears as the trade rules see it. */
export interface Shear {
  edgeType: EdgeType;
  toolKind: ToolKind;
  /** Overall length in inches, in quarter-inch steps. */
  lengthIn: number;
  handedness: Handedness;
  /** Human hair unless said otherwise. */
  use?: ShearUse;
}

function isOneOf<T extends string>(list: readonly T[], value: unknown): value is T {
  return typeof value === 'string' && (list as readonly string[]).includes(value);
}

export const isEdgeType = (value: unknown): value is EdgeType => isOneOf(EDGE_TYPES, value);
export const isToolKind = (value: unknown): value is ToolKind => isOneOf(TOOL_KINDS, value);
export const isHandedness = (value: unknown): value is Handedness => isOneOf(HANDEDNESS, value);
export const isShearUse = (value: unknown): value is ShearUse => isOneOf(SHEAR_USES, value);

export function isToothed(toolKind: ToolKind): toolKind is ToothedToolKind {
  return isOneOf(TOOTHED_TOOL_KINDS, toolKind);
}

export function isValidLength(value: unknown): value is number {
  return (
    typeof value === 'number' &&
    value >= LENGTH_MIN_IN &&
    value <= LENGTH_MAX_IN &&
    Number.isInteger(value / LENGTH_STEP_IN)
  );
}

/** Returns the length if it is a quarter-inch step between the limits; otherwise says what is wrong. */
export function validateLength(value: unknown, field = 'lengthIn'): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RuleError('invalid-length', 'Shear length must be a number of inches.', field);
  }
  if (value < LENGTH_MIN_IN || value > LENGTH_MAX_IN) {
    throw new RuleError(
      'invalid-length',
      `Shear length must be between ${LENGTH_MIN_IN} and ${LENGTH_MAX_IN} inches; got ${value}.`,
      field,
    );
  }
  if (!Number.isInteger(value / LENGTH_STEP_IN)) {
    throw new RuleError(
      'invalid-length',
      `Shear length is measured in quarter inches (like 6, 6.25, 6.5, 6.75); got ${value}.`,
      field,
    );
  }
  return value;
}

function listOf(values: readonly string[]): string {
  return values.join(', ');
}

/** Checks an untrusted shear (a form, a request body) and returns a clean copy. */
export function validateShear(input: unknown, field = 'shear'): Shear {
  if (typeof input !== 'object' || input === null) {
    throw new RuleError('invalid-ticket', 'A shear needs an edge type, tool kind, length and handedness.', field);
  }
  const raw = input as Record<string, unknown>;
  if (!isEdgeType(raw.edgeType)) {
    throw new RuleError(
      'invalid-edge-type',
      `Edge type must be one of ${listOf(EDGE_TYPES)}; got ${String(raw.edgeType)}.`,
      `${field}.edgeType`,
    );
  }
  if (!isToolKind(raw.toolKind)) {
    throw new RuleError(
      'invalid-tool-kind',
      `Tool kind must be one of ${listOf(TOOL_KINDS)}; got ${String(raw.toolKind)}.`,
      `${field}.toolKind`,
    );
  }
  const lengthIn = validateLength(raw.lengthIn, `${field}.lengthIn`);
  if (!isHandedness(raw.handedness)) {
    throw new RuleError(
      'invalid-handedness',
      `Handedness must be right or left; got ${String(raw.handedness)}.`,
      `${field}.handedness`,
    );
  }
  if (raw.use !== undefined && !isShearUse(raw.use)) {
    throw new RuleError('invalid-use', `Use must be hair or grooming; got ${shown(raw.use)}.`, `${field}.use`);
  }
  const shear: Shear = { edgeType: raw.edgeType, toolKind: raw.toolKind, lengthIn, handedness: raw.handedness };
  if (raw.use !== undefined) shear.use = raw.use;
  return shear;
}

/** "6.5 in", as tickets and explanations show a length. */
export function formatLength(lengthIn: number): string {
  return `${lengthIn} in`;
}

/** "convex straight shear, 6.5 in, left-handed": the shear in words, for tickets and price explanations. */
export function describeShear(shear: Shear): string {
  const parts = [
    `${EDGE_TYPE_LABELS[shear.edgeType]} ${TOOL_KIND_LABELS[shear.toolKind]}`,
    formatLength(shear.lengthIn),
  ];
  if (shear.handedness === 'left') parts.push('left-handed');
  if (shear.use === 'grooming') parts.push('grooming');
  return parts.join(', ');
}
