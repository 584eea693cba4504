import { add, dinero, halfUp, multiply, subtract, toSnapshot, transformScale, type Dinero } from 'dinero.js';
import { USD } from 'dinero.js/currencies';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DISCOUNT_MAX_BP, PRICE_MAX_CENTS, TAX_RATE_MAX_BP, TICKET_LINES_MAX } from '../limits.js';
import { EDGE_TYPES, HANDEDNESS, SHEAR_USES, TOOL_KINDS, type Shear } from '../shears.js';
import { priceTicket, type TicketLine, type TicketPrice } from './price-ticket.js';
import { ADD_ON_CODES, type DiscountTier, type RateCard } from './rate-card.js';

const price = fc.integer({ min: 0, max: PRICE_MAX_CENTS });

const shearArb: fc.Arbitrary<Shear> = fc.record({
  edgeType: fc.constantFrom(...EDGE_TYPES),
  toolKind: fc.constantFrom(...TOOL_KINDS),
  lengthIn: fc.integer({ min: 12, max: 48 }).map((quarters) => quarters / 4),
  handedness: fc.constantFrom(...HANDEDNESS),
  use: fc.constantFrom(...SHEAR_USES),
});

const lineArb: fc.Arbitrary<TicketLine> = fc.record({ shear: shearArb, addOns: fc.subarray([...ADD_ON_CODES]) });

const tiersArb: fc.Arbitrary<DiscountTier[]> = fc
  .uniqueArray(fc.integer({ min: 2, max: TICKET_LINES_MAX }), { maxLength: 4 })
  .chain((counts) =>
    fc
      .array(fc.integer({ min: 0, max: DISCOUNT_MAX_BP }), { minLength: counts.length, maxLength: counts.length })
      .map((discounts) => {
        const sortedCounts = [...counts].sort((a, b) => a - b);
        const sortedDiscounts = [...discounts].sort((a, b) => a - b);
        return sortedCounts.map((minPairs, index) => ({ minPairs, discountBp: sortedDiscounts[index]! }));
      }),
  );

const row = fc.record({ straight: price, curved: price, thinning: price, blending: price, chunker: price });

const rateCardArb: fc.Arbitrary<RateCard> = fc.record({
  name: fc.constant('Generated rates (invented for tests)'),
  currency: fc.constant('USD'),
  basePerPairCents: fc.record({ beveled: row, convex: row, 'semi-convex': row, serrated: row }),
  lengthCharge: fc.record({ aboveIn: fc.integer({ min: 12, max: 48 }).map((q) => q / 4), perPairCents: price }),
  leftHandedCents: price,
  addOnCents: fc.record({
    'inside-edge-hone': price,
    'tension-adjustment': price,
    'bumper-replacement': price,
    'tip-realignment': price,
    'set-screw-replacement': price,
    'blade-polish': price,
  }),
  tripChargeCents: price,
  ticketMinimumCents: price,
  multiPairDiscounts: tiersArb,
  servicesTaxable: fc.boolean(),
});

const contextArb = fc.record({ taxRateBp: fc.integer({ min: 0, max: TAX_RATE_MAX_BP }), chargeTrip: fc.boolean() });
const linesArb = fc.array(lineArb, { maxLength: 15 });

const usd = (amount: number) => dinero({ amount, currency: USD });
type Usd = Dinero<number, 'USD'>;
const cents = (money: Usd) => toSnapshot(money).amount;
const percentHalfUp = (money: Usd, bp: number): Usd =>
  transformScale(multiply(money, { amount: bp, scale: 4 }), 2, halfUp);

/** The same ticket worked through dinero.js, from the rate card, to check sums and rounding independently. */
function dineroTotals(lines: readonly TicketLine[], rates: RateCard, taxRateBp: number, chargeTrip: boolean) {
  let linesMoney = usd(0);
  for (const { shear, addOns = [] } of lines) {
    linesMoney = add(linesMoney, usd(rates.basePerPairCents[shear.edgeType][shear.toolKind]));
    if (shear.lengthIn > rates.lengthCharge.aboveIn) linesMoney = add(linesMoney, usd(rates.lengthCharge.perPairCents));
    if (shear.handedness === 'left') linesMoney = add(linesMoney, usd(rates.leftHandedCents));
    for (const code of addOns) linesMoney = add(linesMoney, usd(rates.addOnCents[code]));
  }
  const tier = [...rates.multiPairDiscounts].reverse().find((t) => t.minPairs <= lines.length && t.discountBp > 0);
  const discount = tier ? percentHalfUp(linesMoney, tier.discountBp) : usd(0);
  const work = subtract(linesMoney, discount);
  const topUp = lines.length > 0 ? Math.max(0, rates.ticketMinimumCents - cents(work)) : 0;
  const subtotal = add(add(work, usd(topUp)), usd(chargeTrip ? rates.tripChargeCents : 0));
  const tax = rates.servicesTaxable ? percentHalfUp(subtotal, taxRateBp) : usd(0);
  return {
    lines: cents(linesMoney),
    discount: cents(discount),
    subtotal: cents(subtotal),
    tax: cents(tax),
    total: cents(add(subtotal, tax)),
  };
}

function totalsOf(ticket: TicketPrice) {
  return {
    lines: ticket.linesCents,
    discount: ticket.discount?.cents ?? 0,
    subtotal: ticket.subtotalCents,
    tax: ticket.taxCents,
    total: ticket.totalCents,
  };
}

describe('priceTicket properties', () => {
  it('agrees with dinero.js on every sum and rounding', () => {
    fc.assert(
      fc.property(linesArb, rateCardArb, contextArb, (lines, rates, context) => {
        const ticket = priceTicket(lines, rates, context);
        expect(totalsOf(ticket)).toEqual(dineroTotals(lines, rates, context.taxRateBp, context.chargeTrip));
      }),
      { numRuns: 300 },
    );
  });

  it('never gives a negative amount, and the parts add up', () => {
    fc.assert(
      fc.property(linesArb, rateCardArb, contextArb, (lines, rates, context) => {
        const ticket = priceTicket(lines, rates, context);
        for (const line of ticket.lines) expect(line.totalCents).toBeGreaterThanOrEqual(0);
        expect(ticket.subtotalCents).toBeGreaterThanOrEqual(0);
        expect(ticket.taxCents).toBeGreaterThanOrEqual(0);
        expect(ticket.totalCents).toBeGreaterThanOrEqual(0);
        expect(ticket.subtotalCents).toBe(
          ticket.linesCents - (ticket.discount?.cents ?? 0) + ticket.minimumTopUpCents + ticket.tripChargeCents,
        );
        expect(ticket.totalCents).toBe(ticket.subtotalCents + ticket.taxCents);
      }),
    );
  });

  it('never lowers the pre-discount subtotal when a line is added', () => {
    fc.assert(
      fc.property(
        fc.array(lineArb, { maxLength: 14 }),
        lineArb,
        rateCardArb,
        contextArb,
        (lines, extra, rates, context) => {
          const before = priceTicket(lines, rates, context);
          const after = priceTicket([...lines, extra], rates, context);
          expect(after.preDiscountSubtotalCents).toBeGreaterThanOrEqual(before.preDiscountSubtotalCents);
        },
      ),
    );
  });

  it('keeps the tax within half a cent of the exact product', () => {
    fc.assert(
      fc.property(linesArb, rateCardArb, contextArb, (lines, rates, context) => {
        const ticket = priceTicket(lines, rates, context);
        const exact = (ticket.taxableCents * ticket.taxRateBp) / 10_000;
        expect(Math.abs(ticket.taxCents - exact)).toBeLessThanOrEqual(0.5);
      }),
    );
  });
});
