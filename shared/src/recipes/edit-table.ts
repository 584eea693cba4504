import { RuleError } from '../errors.js';
import { GRADE_MAX_UM, GRADE_MIN_UM, RECIPE_STEPS_MAX } from '../limits.js';
import { EDGE_TYPES, SHEAR_USES, TOOL_KINDS } from '../shears.js';
import { DEFAULT_RECIPE_TABLE } from './default-table.js';
import {
  ABRASIVE_SPEEDS,
  BLADE_SCOPES,
  type FinishRule,
  type RecipeEntry,
  type RecipeTable,
  type RecipeTableEdits,
} from './types.js';

function fail(field: string, message: string): never {
  throw new RuleError('invalid-recipe', message, field);
}

function checkText(value: unknown, field: string): void {
  if (typeof value !== 'string' || value.trim() === '') fail(field, `${field} must be some text.`);
}

function checkGrade(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < GRADE_MIN_UM || value > GRADE_MAX_UM) {
    fail(field, `${field} must be a size from ${GRADE_MIN_UM} to ${GRADE_MAX_UM} µm; got ${String(value)}.`);
  }
  return value;
}

function checkSpeed(value: unknown, field: string): void {
  if (!(ABRASIVE_SPEEDS as readonly unknown[]).includes(value)) {
    fail(field, `${field} must be one of ${ABRASIVE_SPEEDS.join(', ')}; got ${String(value)}.`);
  }
}

function checkFinish(finish: FinishRule, lastDiscUm: number, field: string): void {
  if (finish.kind === 'last-disc') return;
  if (finish.kind !== 'paste-pad') fail(field, `${field} must be last-disc or paste-pad.`);
  const min = checkGrade(finish.minUm, `${field}.minUm`);
  const max = checkGrade(finish.maxUm, `${field}.maxUm`);
  if (min > max) fail(field, `${field}: the pad's smallest rating must not exceed its largest.`);
  if (max >= lastDiscUm) fail(field, `${field}: the pad must be finer than the last disc (${lastDiscUm} µm).`);
  checkSpeed(finish.speed, `${field}.speed`);
  checkText(finish.lookFor, `${field}.lookFor`);
}

/** Refuses a recipe cell that could not be worked: steps out of order, sizes out of range, missing words. */
export function validateRecipeEntry(entry: RecipeEntry, field = 'recipe'): RecipeEntry {
  const untrustedDiscs: unknown = entry.discs;
  if (!Array.isArray(untrustedDiscs) || entry.discs.length === 0 || entry.discs.length > RECIPE_STEPS_MAX) {
    fail(`${field}.discs`, `A recipe needs 1 to ${RECIPE_STEPS_MAX} disc steps.`);
  }
  let previous = Infinity;
  entry.discs.forEach((disc, index) => {
    const at = `${field}.discs[${index}]`;
    const grade = checkGrade(disc.gradeUm, `${at}.gradeUm`);
    if (grade >= previous) fail(at, `Disc steps run coarse to fine: ${grade} µm cannot follow ${previous} µm.`);
    previous = grade;
    checkSpeed(disc.speed, `${at}.speed`);
    checkText(disc.speedNote, `${at}.speedNote`);
    checkText(disc.lookFor, `${at}.lookFor`);
  });
  if (!(BLADE_SCOPES as readonly unknown[]).includes(entry.blades)) {
    fail(`${field}.blades`, `${field}.blades must be one of ${BLADE_SCOPES.join(', ')}.`);
  }
  for (const use of SHEAR_USES) {
    const finish = entry.finish?.[use];
    if (!finish) fail(`${field}.finish.${use}`, `${field} needs a finish for ${use} shears.`);
    checkFinish(finish, previous, `${field}.finish.${use}`);
  }
  if (typeof entry.wipe !== 'boolean') fail(`${field}.wipe`, `${field}.wipe must be true or false.`);
  if (entry.insideEdge !== null) {
    const inside = entry.insideEdge;
    checkText(inside.stone, `${field}.insideEdge.stone`);
    checkText(inside.lubricant, `${field}.insideEdge.lubricant`);
    checkText(inside.note, `${field}.insideEdge.note`);
    if (!Number.isInteger(inside.jisGrit) || inside.jisGrit <= 0) {
      fail(`${field}.insideEdge.jisGrit`, 'The inside-edge stone needs a JIS grit, a whole number above 0.');
    }
  }
  entry.notes.forEach((note, index) => checkText(note, `${field}.notes[${index}]`));
  entry.cautions.forEach((caution, index) => checkText(caution, `${field}.cautions[${index}]`));
  return entry;
}

/** The default table with an owner's edits laid over it, each edited cell checked. */
export function resolveRecipeTable(edits: RecipeTableEdits = {}): RecipeTable {
  const table = {} as Record<string, Record<string, RecipeEntry>>;
  for (const edge of EDGE_TYPES) {
    const row: Record<string, RecipeEntry> = {};
    for (const kind of TOOL_KINDS) {
      const edit = edits[edge]?.[kind];
      const base = DEFAULT_RECIPE_TABLE[edge][kind];
      row[kind] = edit ? validateRecipeEntry({ ...base, ...edit }, `${edge}.${kind}`) : base;
    }
    table[edge] = row;
  }
  return table as RecipeTable;
}
