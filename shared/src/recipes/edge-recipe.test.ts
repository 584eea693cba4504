import { describe, expect, it } from 'vitest';
import { EDGE_TYPES, TOOL_KINDS, type Shear } from '../shears.js';
import { BENCH_CAUTIONS } from './cautions.js';
import { edgeRecipe } from './edge-recipe.js';

const convexHair: Shear = { edgeType: 'convex', toolKind: 'straight', lengthIn: 6, handedness: 'right' };

// Every default checked here is common practice at the bench, with no published source (docs/trade-rules.md).
describe('edgeRecipe defaults (common practice)', () => {
  it('runs the discs coarse to fine: 80, 60, 30, 15, then 9 µm', () => {
    const recipe = edgeRecipe({ ...convexHair, edgeType: 'beveled' });
    expect(recipe.steps.map((step) => step.gradeUm)).toEqual([80, 60, 30, 15, 9]);
    expect(recipe.steps.map((step) => step.order)).toEqual([1, 2, 3, 4, 5]);
    expect(recipe.steps.every((step) => step.surface === 'disc')).toBe(true);
    expect(recipe.steps[1]!.lookFor).toContain('full, even burr');
    expect(recipe.steps[1]!.lookFor).toContain('fold it off');
  });

  it('shows the nearest FEPA P and JIS grades beside each disc (ISO 6344-3, JIS R6001 tables in grit-tables.ts)', () => {
    const recipe = edgeRecipe({ ...convexHair, edgeType: 'beveled' });
    expect(recipe.steps.map((step) => step.fepaP)).toEqual(['P180', 'P240', 'P500', 'P1200', 'P2500']);
    expect(recipe.steps.map((step) => step.jis)).toEqual([null, '#240', '#400', '#800', '#1200']);
  });

  it('gives speed hints: coarse discs high, 30 and 15 µm slower, the pad highest', () => {
    const speeds = edgeRecipe(convexHair).steps.map((step) => [step.gradeUm, step.speed]);
    expect(speeds).toEqual([
      [80, 'high'],
      [60, 'high'],
      [30, 'medium'],
      [15, 'medium'],
      [9, 'medium'],
      [5, 'highest'],
    ]);
  });

  it('finishes beveled edges at 9 µm', () => {
    const recipe = edgeRecipe({ ...convexHair, edgeType: 'beveled' });
    expect(recipe.finish).toEqual({
      kind: 'last-disc',
      gradeUm: 9,
      wipe: true,
      description: 'Finished at the 9 µm disc, then a wipe.',
    });
    expect(recipe.disassemble).toBe(false);
    expect(recipe.insideEdge).toBeNull();
    expect(recipe.benchMinutes).toBe(10);
  });

  it('takes convex human-hair shears on to a 3–7 µm diamond-paste felt pad, then a wipe', () => {
    const recipe = edgeRecipe(convexHair);
    const pad = recipe.steps.at(-1)!;
    expect(pad.surface).toBe('paste-pad');
    expect(pad.gradeRangeUm).toEqual({ minUm: 3, maxUm: 7 });
    expect(pad.fepaP).toBeNull();
    expect(recipe.finish.kind).toBe('paste-pad');
    expect(recipe.finish.description).toBe('Diamond-paste felt pad rated 3–7 µm, then a wipe.');
    expect(recipe.shear.use).toBe('hair');
    expect(recipe.source).toBe('common practice');
  });

  it('finishes grooming shears at 9 µm, convex or not', () => {
    const recipe = edgeRecipe({ ...convexHair, use: 'grooming' });
    expect(recipe.steps.at(-1)!.gradeUm).toBe(9);
    expect(recipe.finish.kind).toBe('last-disc');
  });

  it('takes a convex shear apart for inside-edge work on a ~6000 grit (JIS) stone with a little water', () => {
    const recipe = edgeRecipe(convexHair, { insideEdge: true });
    expect(recipe.disassemble).toBe(true);
    expect(recipe.insideEdge).toMatchObject({ jisGrit: 6000, jis: '#6000', lubricant: 'a little water' });
    // JIS R6001: #6000 is 2.0 µm (from memory).
    expect(recipe.insideEdge!.approxUm).toBe(2.0);
    expect(recipe.insideEdge!.note).toContain('Take the shear apart');
    expect(recipe.benchMinutes).toBe(28);
  });

  it('says so when inside-edge work is asked of an edge that has none', () => {
    const recipe = edgeRecipe({ ...convexHair, edgeType: 'beveled' }, { insideEdge: true });
    expect(recipe.insideEdge).toBeNull();
    expect(recipe.disassemble).toBe(false);
    expect(recipe.notes.join(' ')).toContain('Inside-edge work was asked for, but the beveled recipe has none');
    expect(recipe.benchMinutes).toBe(10);
  });

  it('keeps the serrations: only the plain blade goes on the discs', () => {
    const recipe = edgeRecipe({ ...convexHair, edgeType: 'serrated' });
    expect(recipe.steps.every((step) => step.blades === 'plain-blade')).toBe(true);
    expect(recipe.notes.join(' ')).toContain('Serrations are kept');
    expect(recipe.finish.kind).toBe('last-disc');
    expect(recipe.benchMinutes).toBe(12);
  });

  it('sharpens the straight blade of thinning and blending shears, never the teeth', () => {
    for (const toolKind of ['thinning', 'blending', 'chunker'] as const) {
      const recipe = edgeRecipe({ ...convexHair, toolKind });
      expect(recipe.steps.every((step) => step.blades === 'straight-blade')).toBe(true);
      expect(recipe.notes).toContain('Toothed shear: the straight blade is sharpened; the teeth are not ground.');
      expect(recipe.benchMinutes).toBe(12);
    }
    const serratedThinning = edgeRecipe({ ...convexHair, edgeType: 'serrated', toolKind: 'thinning' });
    expect(serratedThinning.notes.join(' ')).toContain('the teeth are not ground');
    expect(serratedThinning.notes.join(' ')).toContain('Serrations are kept');
  });

  it('carries every bench caution on every recipe', () => {
    for (const edgeType of EDGE_TYPES) {
      for (const toolKind of TOOL_KINDS) {
        for (const use of ['hair', 'grooming'] as const) {
          const recipe = edgeRecipe({ ...convexHair, edgeType, toolKind, use }, { insideEdge: true });
          expect(recipe.cautions.slice(0, BENCH_CAUTIONS.length)).toEqual(BENCH_CAUTIONS);
          expect(recipe.steps.length).toBeGreaterThanOrEqual(5);
        }
      }
    }
    const words = BENCH_CAUTIONS.join(' ');
    for (const phrase of [
      'dust mask or run dust extraction',
      "one side of the disc's centre",
      'drawing across the edge, never along it',
      'face down',
      'fingers clear of the edge when wiping',
      'too hot to touch',
      "equipment maker's instructions and local workplace-safety rules",
    ]) {
      expect(words).toContain(phrase);
    }
  });

  it('refuses a shear that is not valid', () => {
    expect(() => edgeRecipe({ ...convexHair, lengthIn: 2 })).toThrow('between 3 and 12 inches');
  });
});

describe('edgeRecipe with an edited table and bench minutes', () => {
  it('uses the edited cell and says it was edited', () => {
    const recipe = edgeRecipe(convexHair, {
      table: {
        convex: {
          straight: { discs: [{ gradeUm: 30, speed: 'low', speedNote: 'Slow.', lookFor: 'A burr.' }], wipe: false },
        },
      },
      bench: { perPairByEdgeType: { convex: 25 } },
    });
    expect(recipe.steps.map((step) => step.gradeUm)).toEqual([30, 5]);
    expect(recipe.finish.description).toBe('Diamond-paste felt pad rated 3–7 µm.');
    expect(recipe.source).toBe('edited');
    expect(recipe.benchMinutes).toBe(25);
    const untouched = edgeRecipe(
      { ...convexHair, toolKind: 'curved' },
      { table: { convex: { straight: { wipe: false } } } },
    );
    expect(untouched.source).toBe('common practice');
    const noWipe = edgeRecipe({ ...convexHair, use: 'grooming' }, { table: { convex: { straight: { wipe: false } } } });
    expect(noWipe.finish.description).toBe('Finished at the 9 µm disc.');
  });
});
