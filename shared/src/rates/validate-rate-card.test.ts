import { describe, expect, it } from 'vitest';
import { RuleError } from '../errors.js';
import { DEMO_RATE_CARD } from './demo-rate-card.js';
import { DEFAULT_LEFT_HANDED_CENTS, DEFAULT_LENGTH_CHARGE_ABOVE_IN } from './rate-card.js';
import { rateCardProblems, validateRateCard } from './validate-rate-card.js';

function fieldsOf(input: unknown): string[] {
  return rateCardProblems(input).map((problem) => problem.field);
}

describe('the demo rate card', () => {
  it('is valid, invented and says so, with the product defaults', () => {
    expect(rateCardProblems(DEMO_RATE_CARD)).toEqual([]);
    expect(DEMO_RATE_CARD.name).toContain('invented');
    // PRODUCT.md defaults: length charge above 7 in, left-handed at the same price.
    expect(DEFAULT_LENGTH_CHARGE_ABOVE_IN).toBe(7);
    expect(DEFAULT_LEFT_HANDED_CENTS).toBe(0);
    expect(DEMO_RATE_CARD.lengthCharge.aboveIn).toBe(7);
    expect(DEMO_RATE_CARD.leftHandedCents).toBe(0);
  });
});

describe('validateRateCard', () => {
  it('returns a clean copy without extra fields', () => {
    const copy = validateRateCard({ ...DEMO_RATE_CARD, colour: 'teal' });
    expect(copy).toEqual(DEMO_RATE_CARD);
    expect(copy).not.toBe(DEMO_RATE_CARD);
    expect(copy.basePerPairCents.convex).not.toBe(DEMO_RATE_CARD.basePerPairCents.convex);
  });

  it('lists every problem, each with its field', () => {
    expect(rateCardProblems(null)).toEqual([{ field: '', message: 'A rate card must be an object.' }]);
    expect(fieldsOf([])).toEqual(['']);
    const broken = {
      ...DEMO_RATE_CARD,
      name: '',
      currency: 'dollars',
      basePerPairCents: {
        ...DEMO_RATE_CARD.basePerPairCents,
        convex: { ...DEMO_RATE_CARD.basePerPairCents.convex, curved: 46.5 },
      },
      lengthCharge: { aboveIn: 7.1, perPairCents: -5 },
      addOnCents: { ...DEMO_RATE_CARD.addOnCents, 'blade-polish': 100_001 },
      servicesTaxable: 'yes',
    };
    expect(fieldsOf(broken)).toEqual([
      'name',
      'currency',
      'basePerPairCents.convex.curved',
      'lengthCharge.aboveIn',
      'lengthCharge.perPairCents',
      'addOnCents.blade-polish',
      'servicesTaxable',
    ]);
    expect(() => validateRateCard(broken)).toThrow(RuleError);
    expect(() => validateRateCard(broken)).toThrow(
      'basePerPairCents.convex.curved must be whole cents from 0 to 100000; got 46.5.',
    );
    expect(fieldsOf({ ...DEMO_RATE_CARD, basePerPairCents: undefined })).toHaveLength(20);
  });

  it('checks the discount tiers', () => {
    const tiers = (multiPairDiscounts: unknown) => fieldsOf({ ...DEMO_RATE_CARD, multiPairDiscounts });
    expect(tiers([])).toEqual([]);
    expect(tiers('5 for 4')).toEqual(['multiPairDiscounts']);
    expect(tiers(Array.from({ length: 11 }, (_, index) => ({ minPairs: index + 2, discountBp: 100 })))).toEqual([
      'multiPairDiscounts',
    ]);
    expect(tiers([{ minPairs: 1, discountBp: 500 }])).toEqual(['multiPairDiscounts[0].minPairs']);
    expect(tiers([{ minPairs: 5, discountBp: 5001 }])).toEqual(['multiPairDiscounts[0].discountBp']);
    expect(
      tiers([
        { minPairs: 5, discountBp: 500 },
        { minPairs: 5, discountBp: 700 },
      ]),
    ).toEqual(['multiPairDiscounts[1].minPairs']);
    expect(
      tiers([
        { minPairs: 5, discountBp: 500 },
        { minPairs: 8, discountBp: 300 },
      ]),
    ).toEqual(['multiPairDiscounts[1].discountBp']);
    expect(() =>
      validateRateCard({
        ...DEMO_RATE_CARD,
        multiPairDiscounts: [
          { minPairs: 5, discountBp: 500 },
          { minPairs: 3, discountBp: 600 },
        ],
      }),
    ).toThrow('Discount tiers must be listed by rising pair count.');
  });
});
