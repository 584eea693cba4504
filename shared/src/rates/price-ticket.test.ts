import { describe, expect, it } from 'vitest';
import { RuleError } from '../errors.js';
import type { Shear } from '../shears.js';
import { DEMO_RATE_CARD } from './demo-rate-card.js';
import { priceTicket, type TicketLine } from './price-ticket.js';
import { TAX_RULES_NOTE, type AddOnCode, type RateCard } from './rate-card.js';

const shear = (edit: Partial<Shear> = {}): Shear => ({
  edgeType: 'beveled',
  toolKind: 'straight',
  lengthIn: 6,
  handedness: 'right',
  ...edit,
});

// Worked by hand from DEMO_RATE_CARD (invented prices).
describe('priceTicket, worked examples', () => {
  it('explains each line, adds the trip charge and rounds the tax half-up', () => {
    const lines: TicketLine[] = [
      { shear: shear({ edgeType: 'convex', lengthIn: 6.5, handedness: 'left' }), addOns: ['inside-edge-hone'] },
      { shear: shear({ toolKind: 'curved', lengthIn: 7.5 }) },
      { shear: shear({ toolKind: 'thinning' }) },
    ];
    const price = priceTicket(lines, DEMO_RATE_CARD, { taxRateBp: 825, chargeTrip: true });
    expect(price.lines.map((line) => line.totalCents)).toEqual([5700, 3900, 3200]);
    expect(price.lines[0]!.explanation).toBe(
      'convex straight shear, 6.5 in, left-handed: base $42.00 + inside-edge hone $15.00 = $57.00',
    );
    expect(price.lines[1]!.explanation).toBe('beveled curved shear, 7.5 in: base $34.00 + over 7 in $5.00 = $39.00');
    expect(price.lines[2]!.explanation).toBe('beveled thinning shear, 6 in: base $32.00');
    expect(price.linesCents).toBe(12_800);
    expect(price.discount).toBeNull();
    expect(price.minimumTopUpCents).toBe(0);
    expect(price.tripChargeCents).toBe(1000);
    expect(price.preDiscountSubtotalCents).toBe(13_800);
    expect(price.subtotalCents).toBe(13_800);
    expect(price.taxableCents).toBe(13_800);
    expect(price.taxCents).toBe(1139); // 13 800 × 8.25 % = 1138.5 → 1139
    expect(price.totalCents).toBe(14_939);
    expect(price.summary).toEqual(['trip charge for the stop visit: + $10.00', 'tax 8.25% on $138.00 = $11.39']);
    expect(price.taxNote).toBe(TAX_RULES_NOTE);
    expect(price.taxNote).toContain('check local tax rules');
  });

  it('takes the multi-pair discount off the shear lines', () => {
    const lines = Array.from({ length: 5 }, () => ({ shear: shear() }));
    const price = priceTicket(lines, DEMO_RATE_CARD, { taxRateBp: 825 });
    expect(price.linesCents).toBe(15_000);
    expect(price.discount).toEqual({
      minPairs: 5,
      discountBp: 500,
      cents: 750,
      explanation: '5 pairs (5 or more): 5% off $150.00 = −$7.50',
    });
    expect(price.subtotalCents).toBe(14_250);
    expect(price.taxCents).toBe(1176); // 14 250 × 8.25 % = 1175.625 → 1176
    expect(price.totalCents).toBe(15_426);
  });

  it('uses the highest tier reached and rounds the discount half-up', () => {
    const rates: RateCard = {
      ...DEMO_RATE_CARD,
      basePerPairCents: {
        ...DEMO_RATE_CARD.basePerPairCents,
        beveled: { ...DEMO_RATE_CARD.basePerPairCents.beveled, straight: 1001 },
      },
      multiPairDiscounts: [
        { minPairs: 2, discountBp: 250 },
        { minPairs: 10, discountBp: 750 },
      ],
    };
    const ten = priceTicket(
      Array.from({ length: 10 }, () => ({ shear: shear() })),
      rates,
      { taxRateBp: 0 },
    );
    expect(ten.discount?.discountBp).toBe(750);
    expect(ten.discount?.cents).toBe(751); // 10 010 × 7.5 % = 750.75 → 751
    const two = priceTicket([{ shear: shear() }, { shear: shear() }], rates, { taxRateBp: 0 });
    expect(two.discount?.cents).toBe(50); // 2002 × 2.5 % = 50.05 → 50
    expect(two.totalCents).toBe(2500); // 2002 − 50 = 1952 is under the 2500 minimum
    expect(two.minimumTopUpCents).toBe(548);
  });

  it('raises a small ticket to the minimum, and leaves an empty one alone', () => {
    const rates = { ...DEMO_RATE_CARD, ticketMinimumCents: 3500 };
    const one = priceTicket([{ shear: shear() }], rates, { taxRateBp: 0 });
    expect(one.minimumTopUpCents).toBe(500);
    expect(one.totalCents).toBe(3500);
    expect(one.summary[0]).toBe('ticket minimum $35.00: + $5.00');
    const empty = priceTicket([], rates, { taxRateBp: 825, chargeTrip: true });
    expect(empty.minimumTopUpCents).toBe(0);
    expect(empty.totalCents).toBe(1083); // trip 1000 + 82.5 → 83 tax
  });

  it('adds the left-handed charge and every add-on when the card has them', () => {
    const addOns: AddOnCode[] = [
      'tension-adjustment',
      'bumper-replacement',
      'tip-realignment',
      'set-screw-replacement',
      'blade-polish',
    ];
    const rates = { ...DEMO_RATE_CARD, leftHandedCents: 700, multiPairDiscounts: [] };
    const price = priceTicket([{ shear: shear({ handedness: 'left', lengthIn: 8 }), addOns }], rates, { taxRateBp: 0 });
    // 3000 + 500 over 7 in + 700 left + 500 + 300 + 1000 + 400 + 800 = 7200
    expect(price.lines[0]!.totalCents).toBe(7200);
    expect(price.lines[0]!.parts.map((part) => part.label)).toEqual([
      'base',
      'over 7 in',
      'left-handed',
      'tension/pivot adjustment',
      'bumper or silencer replacement',
      'tip realignment',
      'set-screw replacement',
      'blade polish',
    ]);
  });

  it('charges no tax when services are not taxable, and formats in the locale', () => {
    const rates = { ...DEMO_RATE_CARD, servicesTaxable: false, currency: 'EUR' };
    const price = priceTicket([{ shear: shear({ edgeType: 'convex' }) }], rates, { taxRateBp: 2000, locale: 'de-DE' });
    expect(price.taxableCents).toBe(0);
    expect(price.taxCents).toBe(0);
    expect(price.totalCents).toBe(4200);
    expect(price.summary).toEqual(['services not taxed (rate card setting)']);
    expect(price.lines[0]!.explanation).toBe('convex straight shear, 6 in: base 42,00\u00a0€');
  });
});

describe('priceTicket refuses what it cannot price', () => {
  const context = { taxRateBp: 825 };
  const catchRule = (run: () => unknown): RuleError => {
    try {
      run();
    } catch (error) {
      if (error instanceof RuleError) return error;
    }
    throw new Error('expected a RuleError');
  };

  it('names the wrong field', () => {
    expect(catchRule(() => priceTicket([{ shear: shear({ lengthIn: 13 }) }], DEMO_RATE_CARD, context)).field).toBe(
      'lines[0].shear.lengthIn',
    );
    expect(
      catchRule(() => priceTicket([{ shear: shear(), addOns: ['engraving' as AddOnCode] }], DEMO_RATE_CARD, context))
        .message,
    ).toBe('Unknown add-on service engraving.');
    expect(
      catchRule(() =>
        priceTicket([{ shear: shear(), addOns: ['blade-polish', 'blade-polish'] }], DEMO_RATE_CARD, context),
      ).message,
    ).toBe('blade polish is listed twice.');
    expect(
      catchRule(() =>
        priceTicket([{ shear: shear(), addOns: 'polish' as unknown as AddOnCode[] }], DEMO_RATE_CARD, context),
      ).field,
    ).toBe('lines[0].addOns');
    expect(
      catchRule(() =>
        priceTicket(
          Array.from({ length: 61 }, () => ({ shear: shear() })),
          DEMO_RATE_CARD,
          context,
        ),
      ).message,
    ).toBe('A ticket holds at most 60 shears.');
    expect(catchRule(() => priceTicket([], DEMO_RATE_CARD, { taxRateBp: -1 })).field).toBe('context.taxRateBp');
    expect(catchRule(() => priceTicket([null as unknown as TicketLine], DEMO_RATE_CARD, context)).field).toBe(
      'lines[0].shear',
    );
    expect(catchRule(() => priceTicket([], { ...DEMO_RATE_CARD, tripChargeCents: 1.5 }, context)).code).toBe(
      'invalid-rate-card',
    );
  });
});
