import type { EdgeType, Shear, ShearUse, ToolKind } from '../shears.js';
import type { BenchMinuteEdits } from '../bench-time.js';

/** Disc speed hints, as a machine's speed control reads: coarse discs high, finer discs slower, the pad highest. */
export const ABRASIVE_SPEEDS = ['low', 'medium', 'high', 'highest'] as const;
export type AbrasiveSpeed = (typeof ABRASIVE_SPEEDS)[number];

/** Which blades the abrasive steps are for. */
export const BLADE_SCOPES = ['both-blades', 'straight-blade', 'plain-blade'] as const;
export type BladeScope = (typeof BLADE_SCOPES)[number];

export const BLADE_SCOPE_LABELS: Readonly<Record<BladeScope, string>> = {
  'both-blades': 'both blades',
  'straight-blade': 'the straight (cutting) blade only; the teeth are not ground',
  'plain-blade': 'the plain blade only; the serrated blade is not ground',
};

/** One abrasive disc in a recipe table. */
export interface DiscStepRule {
  gradeUm: number;
  speed: AbrasiveSpeed;
  speedNote: string;
  lookFor: string;
}

export type FinishRule =
  { kind: 'last-disc' } | { kind: 'paste-pad'; minUm: number; maxUm: number; speed: AbrasiveSpeed; lookFor: string };

/** How the inside edge is re-established when a shear needs it. */
export interface InsideEdgeRule {
  stone: string;
  /** Grit on the Japanese scale (JIS R6001). */
  jisGrit: number;
  lubricant: string;
  note: string;
}

/** One cell of the recipe table: the plan for one edge type and tool kind. */
export interface RecipeEntry {
  /** Coarse to fine. */
  discs: readonly DiscStepRule[];
  blades: BladeScope;
  finish: Readonly<Record<ShearUse, FinishRule>>;
  /** Wipe the blades clean after the finish. */
  wipe: boolean;
  /** What is done when the inside edge is asked for; null when this edge type is not honed on the inside. */
  insideEdge: InsideEdgeRule | null;
  notes: readonly string[];
  /** Cautions beyond the bench cautions every recipe carries. */
  cautions: readonly string[];
}

export type RecipeTable = Readonly<Record<EdgeType, Readonly<Record<ToolKind, RecipeEntry>>>>;

/** An owner's changes: any cell, any field; the rest keeps its default. */
export type RecipeTableEdits = { [E in EdgeType]?: { [K in ToolKind]?: Partial<RecipeEntry> } };

export interface EdgeRecipeOptions {
  table?: RecipeTableEdits;
  bench?: BenchMinuteEdits;
  /** The shear needs inside-edge work (convex and semi-convex shears are then taken apart). */
  insideEdge?: boolean;
}

export interface RecipeStep {
  order: number;
  surface: 'disc' | 'paste-pad';
  /** The step's grade in micrometres; for the pad, the middle of its rated range. */
  gradeUm: number;
  gradeRangeUm: { minUm: number; maxUm: number } | null;
  /** Nearest FEPA P grade (ISO 6344), for display; null when the size is outside that scale. */
  fepaP: string | null;
  /** Nearest JIS R6001 grade, for display; null when the size is outside that scale. */
  jis: string | null;
  speed: AbrasiveSpeed;
  speedNote: string;
  lookFor: string;
  blades: BladeScope;
}

export interface InsideEdgePlan extends InsideEdgeRule {
  /** "#6000". */
  jis: string;
  /** Size of that JIS grade in micrometres, when the table has it. */
  approxUm: number | null;
}

export interface RecipeFinish {
  kind: 'last-disc' | 'paste-pad';
  gradeUm: number;
  wipe: boolean;
  description: string;
}

export interface EdgeRecipe {
  shear: Shear & { use: ShearUse };
  steps: RecipeStep[];
  /** Taken apart at the bench (for inside-edge work). */
  disassemble: boolean;
  insideEdge: InsideEdgePlan | null;
  finish: RecipeFinish;
  /** Bench minutes for this pair, without the stop's setup. */
  benchMinutes: number;
  cautions: string[];
  notes: string[];
  /** Keenroute's defaults (common practice), or a cell the owner edited. */
  source: 'common practice' | 'edited';
}
