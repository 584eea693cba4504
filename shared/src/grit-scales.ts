import { RuleError } from './errors.js';
import { GRADE_MAX_UM, GRADE_MIN_UM } from './limits.js';
import { GRIT_SCALES, GRIT_TABLES, type GritScale } from './grit-tables.js';

export { GRIT_SCALES, GRIT_TABLES, type GritScale, type GritScaleTable, type GritTablePart } from './grit-tables.js';

/** One grade of one scale with its size. */
export interface GritGrade {
  scale: GritScale;
  /** The grade number: 240 for P240, 6000 for #6000. */
  grade: number;
  /** As it is written: "P240", "F230", "#6000". */
  label: string;
  /** Size in micrometres, per `measure`. */
  um: number;
  standard: string;
  measure: string;
}

/** A size further than this factor from every grade of a scale has no nearest grade there (returns null). */
export const NEAREST_GRADE_MAX_RATIO = 1.25;

const flattened = new Map<GritScale, readonly GritGrade[]>();

/** Every grade of a scale, coarse to fine. */
export function gritGrades(scale: GritScale): readonly GritGrade[] {
  const known = flattened.get(scale);
  if (known) return known;
  const table = GRIT_TABLES[scale];
  const grades = table.parts.flatMap((part) =>
    part.rows.map(([grade, um]) => ({
      scale,
      grade,
      label: `${table.prefix}${grade}`,
      um,
      standard: part.standard,
      measure: part.measure,
    })),
  );
  flattened.set(scale, grades);
  return grades;
}

export function isGritScale(value: unknown): value is GritScale {
  return typeof value === 'string' && (GRIT_SCALES as readonly string[]).includes(value);
}

export function formatGrade(scale: GritScale, grade: number): string {
  return `${GRIT_TABLES[scale].prefix}${grade}`;
}

/** Reads "P240", "p 240", "#6000", "F230" or a bare number as a grade number of the given scale. */
export function parseGrade(scale: GritScale, input: string | number): number {
  const table = GRIT_TABLES[scale];
  if (typeof input === 'number') {
    if (Number.isInteger(input) && input > 0) return input;
    throw new RuleError('invalid-grade', `A grade number is a whole number above 0; got ${input}.`);
  }
  const match = /^\s*(P|F|#)?\s*(\d+)\s*$/i.exec(input);
  const prefix = match?.[1]?.toUpperCase();
  if (!match || (prefix !== undefined && prefix !== table.prefix)) {
    throw new RuleError('invalid-grade', `"${input}" is not a ${table.name} grade (written like ${table.prefix}240).`);
  }
  return Number(match[2]);
}

export function findGrade(scale: GritScale, input: string | number): GritGrade | undefined {
  const grade = parseGrade(scale, input);
  return gritGrades(scale).find((row) => row.grade === grade);
}

/** The size in micrometres of a published grade; a grade the table lacks is an error. */
export function gradeToMicrometres(scale: GritScale, input: string | number): number {
  const found = findGrade(scale, input);
  if (!found) {
    throw new RuleError('invalid-grade', `${String(input)} is not in the ${GRIT_TABLES[scale].name} table.`);
  }
  return found.um;
}

function checkSize(um: number): void {
  if (!Number.isFinite(um) || um < GRADE_MIN_UM || um > GRADE_MAX_UM) {
    throw new RuleError(
      'invalid-size',
      `An abrasive size must be between ${GRADE_MIN_UM} and ${GRADE_MAX_UM} micrometres; got ${um}.`,
    );
  }
}

/**
 * The grade whose size is nearest to `um`, measured as a ratio (grade series are geometric), or null when even the
 * nearest is further than `maxRatio` away (the size lies outside what the scale covers).
 */
export function nearestGrade(scale: GritScale, um: number, options: { maxRatio?: number } = {}): GritGrade | null {
  checkSize(um);
  const maxRatio = options.maxRatio ?? NEAREST_GRADE_MAX_RATIO;
  let best: GritGrade | null = null;
  let bestDistance = Infinity;
  for (const row of gritGrades(scale)) {
    const distance = Math.abs(Math.log(row.um / um));
    if (distance < bestDistance) {
      best = row;
      bestDistance = distance;
    }
  }
  return bestDistance <= Math.log(maxRatio) + 1e-12 ? best : null;
}

/** A grade of one scale to the nearest grade of another, through its size. */
export function convertGrade(
  from: GritScale,
  input: string | number,
  to: GritScale,
  options: { maxRatio?: number } = {},
): GritGrade | null {
  return nearestGrade(to, gradeToMicrometres(from, input), options);
}
