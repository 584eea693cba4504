import { describe, expect, it } from 'vitest';
import { DEFAULT_DISC_STEPS, DEFAULT_RECIPE_TABLE } from './default-table.js';
import { resolveRecipeTable, validateRecipeEntry } from './edit-table.js';
import type { RecipeEntry } from './types.js';

const convex = DEFAULT_RECIPE_TABLE.convex.straight;

function withEdit(edit: Partial<RecipeEntry>): RecipeEntry {
  return { ...convex, ...edit };
}

describe('recipe table edits', () => {
  it('keeps every default cell valid', () => {
    for (const row of Object.values(DEFAULT_RECIPE_TABLE)) {
      for (const [kind, entry] of Object.entries(row)) expect(validateRecipeEntry(entry, kind)).toBe(entry);
    }
    expect(resolveRecipeTable()).toEqual(DEFAULT_RECIPE_TABLE);
  });

  it('lays edits over the defaults, cell by cell', () => {
    const table = resolveRecipeTable({ beveled: { curved: { notes: ['Check the tip.'] } } });
    expect(table.beveled.curved.notes).toEqual(['Check the tip.']);
    expect(table.beveled.curved.discs).toBe(DEFAULT_DISC_STEPS);
    expect(table.beveled.straight).toBe(DEFAULT_RECIPE_TABLE.beveled.straight);
  });

  it('refuses steps that could not be worked, naming the cell', () => {
    const disc = DEFAULT_DISC_STEPS[0]!;
    expect(() => resolveRecipeTable({ convex: { curved: { discs: [] } } })).toThrow('1 to 12 disc steps');
    expect(() => validateRecipeEntry(withEdit({ discs: [disc, { ...disc, gradeUm: 120 }] }))).toThrow(
      'Disc steps run coarse to fine: 120 µm cannot follow 80 µm.',
    );
    expect(() => validateRecipeEntry(withEdit({ discs: [{ ...disc, gradeUm: 0 }] }))).toThrow('from 0.1 to 5000 µm');
    expect(() => validateRecipeEntry(withEdit({ discs: [{ ...disc, speed: 'fast' as 'high' }] }))).toThrow(
      'must be one of low, medium, high, highest',
    );
    expect(() => validateRecipeEntry(withEdit({ discs: [{ ...disc, lookFor: ' ' }] }))).toThrow('must be some text');
    expect(() => validateRecipeEntry(withEdit({ blades: 'teeth' as 'both-blades' }))).toThrow('blades must be one of');
    expect(() => validateRecipeEntry(withEdit({ wipe: 'yes' as unknown as boolean }))).toThrow(
      'wipe must be true or false',
    );
    expect(() => validateRecipeEntry(withEdit({ notes: [''] }))).toThrow('notes[0]');
    expect(() => validateRecipeEntry(withEdit({ cautions: [''] }))).toThrow('cautions[0]');
  });

  it('refuses finishes and inside-edge stones that make no sense', () => {
    const pad = { kind: 'paste-pad', minUm: 3, maxUm: 7, speed: 'highest', lookFor: 'Polish.' } as const;
    expect(() => validateRecipeEntry(withEdit({ finish: { hair: { ...pad, minUm: 8 }, grooming: pad } }))).toThrow(
      "the pad's smallest rating must not exceed its largest",
    );
    expect(() => validateRecipeEntry(withEdit({ finish: { hair: { ...pad, maxUm: 9 }, grooming: pad } }))).toThrow(
      'the pad must be finer than the last disc (9 µm)',
    );
    expect(() =>
      validateRecipeEntry(withEdit({ finish: { hair: { kind: 'wax' } as unknown as typeof pad, grooming: pad } })),
    ).toThrow('must be last-disc or paste-pad');
    expect(() =>
      validateRecipeEntry(withEdit({ finish: { grooming: pad } as unknown as RecipeEntry['finish'] })),
    ).toThrow('needs a finish for hair shears');
    expect(() => validateRecipeEntry(withEdit({ insideEdge: { ...convex.insideEdge!, jisGrit: 0 } }))).toThrow(
      'The inside-edge stone needs a JIS grit',
    );
    expect(validateRecipeEntry(withEdit({ insideEdge: null })).insideEdge).toBeNull();
  });
});
