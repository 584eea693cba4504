import { RuleError } from './errors.js';
import { BENCH_MINUTES_MAX, PAIRS_PER_VISIT_MAX } from './limits.js';
import {
  EDGE_TYPES,
  TOOTHED_TOOL_KINDS,
  isEdgeType,
  isToolKind,
  isToothed,
  type EdgeType,
  type ToolKind,
  type ToothedToolKind,
} from './shears.js';

/** Minutes at the bench; the route planner and the booking capacity check add them up. */
export interface BenchMinuteDefaults {
  /** Unpacking and setting up the bench at each stop visit. */
  setupPerStop: number;
  /** Per pair of a straight or curved shear, by edge type. */
  perPairByEdgeType: Readonly<Record<EdgeType, number>>;
  /** Per pair of a toothed shear, whatever its edge: the straight blade is sharpened, the teeth are not ground. */
  perPairByToothedKind: Readonly<Record<ToothedToolKind, number>>;
  /** Added per pair whose inside edge is honed (taken apart, fine stone). */
  insideEdgeHone: number;
}

/**
 * Common practice (no published source): setup 10, beveled 10, convex 18 (+10 inside edge), thinning or blending 12,
 * serrated 12. Semi-convex (18, as convex) and chunker (12, as thinning) are Keenroute's own defaults.
 */
export const DEFAULT_BENCH_MINUTES: BenchMinuteDefaults = {
  setupPerStop: 10,
  perPairByEdgeType: { beveled: 10, convex: 18, 'semi-convex': 18, serrated: 12 },
  perPairByToothedKind: { thinning: 12, blending: 12, chunker: 12 },
  insideEdgeHone: 10,
};

/** An owner's changes to the defaults; anything left out keeps its default. */
export interface BenchMinuteEdits {
  setupPerStop?: number;
  perPairByEdgeType?: Partial<Record<EdgeType, number>>;
  perPairByToothedKind?: Partial<Record<ToothedToolKind, number>>;
  insideEdgeHone?: number;
}

/** Shears of one kind booked or brought to a stop visit. */
export interface BenchPair {
  edgeType: EdgeType;
  toolKind: ToolKind;
  /** The inside edge is honed (convex shears taken apart). */
  insideEdge?: boolean;
  /** How many such pairs; 1 if left out. */
  count?: number;
}

export interface BenchTimeOptions {
  minutes?: BenchMinuteEdits;
  /** Count the setup at the stop; true unless the pairs are added to a visit already counted. */
  includeSetup?: boolean;
}

export interface BenchTime {
  setupMinutes: number;
  pairMinutes: number;
  insideEdgeMinutes: number;
  totalMinutes: number;
  pairCount: number;
}

function checkMinutes(value: unknown, field: string): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 0 || value > BENCH_MINUTES_MAX) {
    throw new RuleError(
      'invalid-bench-minutes',
      `${field} must be whole minutes from 0 to ${BENCH_MINUTES_MAX}; got ${String(value)}.`,
      field,
    );
  }
  return value;
}

/** The defaults with an owner's edits laid over them, every value checked. */
export function resolveBenchMinutes(edits: BenchMinuteEdits = {}): BenchMinuteDefaults {
  const byEdge = { ...DEFAULT_BENCH_MINUTES.perPairByEdgeType, ...edits.perPairByEdgeType };
  const byKind = { ...DEFAULT_BENCH_MINUTES.perPairByToothedKind, ...edits.perPairByToothedKind };
  for (const edge of EDGE_TYPES) checkMinutes(byEdge[edge], `perPairByEdgeType.${edge}`);
  for (const kind of TOOTHED_TOOL_KINDS) checkMinutes(byKind[kind], `perPairByToothedKind.${kind}`);
  return {
    setupPerStop: checkMinutes(edits.setupPerStop ?? DEFAULT_BENCH_MINUTES.setupPerStop, 'setupPerStop'),
    perPairByEdgeType: byEdge,
    perPairByToothedKind: byKind,
    insideEdgeHone: checkMinutes(edits.insideEdgeHone ?? DEFAULT_BENCH_MINUTES.insideEdgeHone, 'insideEdgeHone'),
  };
}

function pairMinutes(pair: BenchPair, minutes: BenchMinuteDefaults): { pair: number; insideEdge: number } {
  if (!isEdgeType(pair.edgeType)) {
    throw new RuleError('invalid-edge-type', `Unknown edge type ${String(pair.edgeType)}.`, 'edgeType');
  }
  if (!isToolKind(pair.toolKind)) {
    throw new RuleError('invalid-tool-kind', `Unknown tool kind ${String(pair.toolKind)}.`, 'toolKind');
  }
  const base = isToothed(pair.toolKind)
    ? minutes.perPairByToothedKind[pair.toolKind]
    : minutes.perPairByEdgeType[pair.edgeType];
  return { pair: base, insideEdge: pair.insideEdge ? minutes.insideEdgeHone : 0 };
}

/** Minutes for one pair, inside-edge honing included, without the stop's setup. */
export function pairBenchMinutes(pair: BenchPair, edits?: BenchMinuteEdits): number {
  const parts = pairMinutes(pair, resolveBenchMinutes(edits));
  return parts.pair + parts.insideEdge;
}

/** Bench time of one stop visit, in parts. */
export function benchTime(pairs: readonly BenchPair[], options: BenchTimeOptions = {}): BenchTime {
  const minutes = resolveBenchMinutes(options.minutes);
  let pairCount = 0;
  let pairTotal = 0;
  let insideEdgeTotal = 0;
  for (const [index, pair] of pairs.entries()) {
    const count = pair.count ?? 1;
    if (!Number.isInteger(count) || count < 0) {
      throw new RuleError(
        'invalid-count',
        `A pair count must be a whole number, 0 or more; got ${count}.`,
        `pairs[${index}].count`,
      );
    }
    const parts = pairMinutes(pair, minutes);
    pairCount += count;
    pairTotal += parts.pair * count;
    insideEdgeTotal += parts.insideEdge * count;
  }
  if (pairCount > PAIRS_PER_VISIT_MAX) {
    throw new RuleError(
      'invalid-count',
      `One stop visit can take at most ${PAIRS_PER_VISIT_MAX} pairs; got ${pairCount}.`,
      'pairs',
    );
  }
  const setupMinutes = options.includeSetup === false ? 0 : minutes.setupPerStop;
  return {
    setupMinutes,
    pairMinutes: pairTotal,
    insideEdgeMinutes: insideEdgeTotal,
    totalMinutes: setupMinutes + pairTotal + insideEdgeTotal,
    pairCount,
  };
}

/** Total bench minutes of one stop visit: setup plus every pair (and inside-edge honing). */
export function benchMinutes(pairs: readonly BenchPair[], options: BenchTimeOptions = {}): number {
  return benchTime(pairs, options).totalMinutes;
}
