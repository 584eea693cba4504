import { DEMO_RATE_CARD, priceTicket, taxCents, type RateCard } from '@keenroute/shared';
import { priceLines, type PricingLine } from './ticket-pricing';

const line = (over: Partial<PricingLine['shear']> = {}, addOns: PricingLine['addOns'] = []): PricingLine => ({
  shear: {
    tagCode: 'KR-000001',
    edgeType: 'convex',
    toolKind: 'straight',
    lengthIn: 6.5,
    handedness: 'right',
    ...over,
  },
  addOns,
  overrideCents: null,
  overrideReason: null,
});

describe('priceLines', () => {
  const lines = [
    line(),
    line({ tagCode: 'KR-000002', toolKind: 'thinning', lengthIn: 7.5 }, ['inside-edge-hone']),
    line({ tagCode: 'KR-000003', edgeType: 'beveled', handedness: 'left' }, ['tension-adjustment', 'blade-polish']),
  ];

  it.each([
    [825, true],
    [0, false],
    [1000, true],
  ])('equals priceTicket to the cent without overrides (tax %i bp, trip %s)', (taxRateBp, chargeTrip) => {
    const sut = priceLines(lines, DEMO_RATE_CARD, { taxRateBp, chargeTrip });
    const rules = priceTicket(
      lines.map((l) => ({ shear: l.shear, addOns: l.addOns })),
      DEMO_RATE_CARD,
      { taxRateBp, chargeTrip },
    );
    expect(sut.subtotalCents).toBe(rules.subtotalCents);
    expect(sut.taxCents).toBe(rules.taxCents);
    expect(sut.totalCents).toBe(rules.totalCents);
    expect(sut.summary).toEqual(rules.summary);
    expect(sut.lines.map((l) => l.priceCents)).toEqual(rules.lines.map((l) => l.totalCents));
  });

  it('moves the subtotal by the override and takes tax again on the new subtotal', () => {
    const rules = priceLines(lines, DEMO_RATE_CARD, { taxRateBp: 825, chargeTrip: true });
    const overridden = lines.map((l, i) => (i === 1 ? { ...l, overrideCents: 2000, overrideReason: 'Loyal shop' } : l));
    const sut = priceLines(overridden, DEMO_RATE_CARD, { taxRateBp: 825, chargeTrip: true });
    const subtotal = rules.subtotalCents + 2000 - rules.lines[1]!.priceCents;
    expect(sut.rulesSubtotalCents).toBe(rules.subtotalCents);
    expect(sut.subtotalCents).toBe(subtotal);
    expect(sut.taxCents).toBe(taxCents(subtotal, 825));
    expect(sut.totalCents).toBe(subtotal + taxCents(subtotal, 825));
    expect(sut.summary.join('\n')).toContain('KR-000002');
    expect(sut.summary.join('\n')).toContain('Loyal shop');
  });

  it('never goes below zero, and takes no tax when services are not taxed', () => {
    const untaxed: RateCard = { ...DEMO_RATE_CARD, servicesTaxable: false };
    const free = [{ ...line(), overrideCents: 0, overrideReason: 'Warranty re-do' }];
    const sut = priceLines(free, untaxed, { taxRateBp: 825, chargeTrip: false });
    expect(sut.subtotalCents).toBe(0);
    expect(sut.taxCents).toBe(0);
    expect(sut.totalCents).toBe(0);
  });
});
