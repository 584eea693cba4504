import { describe, expect, it } from 'vitest';
import {
  DEFAULT_BENCH_MINUTES,
  benchMinutes,
  benchTime,
  pairBenchMinutes,
  resolveBenchMinutes,
  type BenchPair,
} from './bench-time.js';
import type { EdgeType, ToolKind } from './shears.js';

describe('bench minutes per pair (common practice defaults)', () => {
  it('uses the defaults: beveled 10, convex 18 (+10 inside edge), thinning or blending 12, serrated 12', () => {
    expect(pairBenchMinutes({ edgeType: 'beveled', toolKind: 'straight' })).toBe(10);
    expect(pairBenchMinutes({ edgeType: 'convex', toolKind: 'curved' })).toBe(18);
    expect(pairBenchMinutes({ edgeType: 'convex', toolKind: 'straight', insideEdge: true })).toBe(28);
    expect(pairBenchMinutes({ edgeType: 'convex', toolKind: 'thinning' })).toBe(12);
    expect(pairBenchMinutes({ edgeType: 'beveled', toolKind: 'blending' })).toBe(12);
    expect(pairBenchMinutes({ edgeType: 'serrated', toolKind: 'straight' })).toBe(12);
    expect(DEFAULT_BENCH_MINUTES.setupPerStop).toBe(10);
  });

  it("fills the gaps with Keenroute's own defaults: semi-convex as convex, chunker as thinning", () => {
    expect(pairBenchMinutes({ edgeType: 'semi-convex', toolKind: 'straight' })).toBe(18);
    expect(pairBenchMinutes({ edgeType: 'beveled', toolKind: 'chunker' })).toBe(12);
  });

  it('refuses an unknown edge type or tool kind', () => {
    expect(() => pairBenchMinutes({ edgeType: 'hollow' as EdgeType, toolKind: 'straight' })).toThrow(
      'Unknown edge type hollow.',
    );
    expect(() => pairBenchMinutes({ edgeType: 'convex', toolKind: 'razor' as ToolKind })).toThrow(
      'Unknown tool kind razor.',
    );
  });
});

describe('bench minutes for a stop visit', () => {
  const booked: BenchPair[] = [
    { edgeType: 'beveled', toolKind: 'straight', count: 3 },
    { edgeType: 'convex', toolKind: 'straight', insideEdge: true },
    { edgeType: 'convex', toolKind: 'curved', count: 2 },
    { edgeType: 'beveled', toolKind: 'thinning' },
  ];

  it('adds setup, pairs and inside-edge honing, worked by hand', () => {
    // 10 setup + 3×10 + (18 + 10) + 2×18 + 12 = 116
    expect(benchMinutes(booked)).toBe(116);
    expect(benchTime(booked)).toEqual({
      setupMinutes: 10,
      pairMinutes: 96,
      insideEdgeMinutes: 10,
      totalMinutes: 116,
      pairCount: 7,
    });
    expect(benchMinutes([])).toBe(10);
    expect(benchMinutes(booked, { includeSetup: false })).toBe(106);
  });

  it('takes edited defaults', () => {
    const minutes = {
      setupPerStop: 15,
      perPairByEdgeType: { convex: 20 },
      perPairByToothedKind: { thinning: 14 },
      insideEdgeHone: 12,
    };
    // 15 + 3×10 + (20 + 12) + 2×20 + 14 = 131
    expect(benchMinutes(booked, { minutes })).toBe(131);
    expect(resolveBenchMinutes(minutes).perPairByEdgeType.beveled).toBe(10);
  });

  it('refuses impossible minutes and counts', () => {
    expect(() => resolveBenchMinutes({ setupPerStop: -1 })).toThrow('setupPerStop must be whole minutes from 0 to 240');
    expect(() => resolveBenchMinutes({ perPairByEdgeType: { beveled: 7.5 } })).toThrow('perPairByEdgeType.beveled');
    expect(() => resolveBenchMinutes({ perPairByToothedKind: { chunker: 241 } })).toThrow(
      'perPairByToothedKind.chunker',
    );
    expect(() => benchMinutes([{ edgeType: 'beveled', toolKind: 'straight', count: 1.5 }])).toThrow(
      'A pair count must be a whole number',
    );
    expect(() => benchMinutes([{ edgeType: 'beveled', toolKind: 'straight', count: 501 }])).toThrow(
      'at most 500 pairs',
    );
  });
});
