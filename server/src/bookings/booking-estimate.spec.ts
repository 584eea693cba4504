import { DEMO_RATE_CARD, priceTicket, type RateCard } from '@keenroute/shared';
import { estimateBooking } from './booking-estimate';

describe('estimateBooking', () => {
  const items = [
    { edgeType: 'convex', toolKind: 'straight', count: 2 },
    { edgeType: 'beveled', toolKind: 'thinning', count: 1 },
  ] as const;

  it('is priceTicket over the rate card for 6.5 in right-handed shears, with lines adding up to the total', () => {
    const sut = estimateBooking(items, DEMO_RATE_CARD, 825);
    const shear = (edgeType: 'convex' | 'beveled', toolKind: 'straight' | 'thinning') => ({
      shear: { edgeType, toolKind, lengthIn: 6.5, handedness: 'right' as const },
    });
    const direct = priceTicket(
      [shear('convex', 'straight'), shear('convex', 'straight'), shear('beveled', 'thinning')],
      DEMO_RATE_CARD,
      { taxRateBp: 825 },
    );
    expect(sut.estimateCents).toBe(direct.totalCents);
    expect(sut.lines.reduce((sum, line) => sum + line.cents, 0)).toBe(sut.estimateCents);
    expect(sut.lines[0]!.label).toMatch(/^2 × convex straight shear \(estimate\)$/);
    expect(sut.benchMinutes).toBe(2 * 18 + 12);
    expect(sut.note).toMatch(/estimate/i);
  });

  it('shows a multi-pair discount and the ticket minimum as their own lines', () => {
    const card: RateCard = {
      ...DEMO_RATE_CARD,
      multiPairDiscounts: [{ minPairs: 3, discountBp: 1000 }],
      ticketMinimumCents: 50_000,
    };
    const sut = estimateBooking(items, card, 0);
    expect(sut.lines.some((line) => line.cents < 0)).toBe(true);
    expect(sut.lines.find((line) => line.label === 'ticket minimum')!.cents).toBeGreaterThan(0);
    expect(sut.lines.reduce((sum, line) => sum + line.cents, 0)).toBe(sut.estimateCents);
    // At a 0 % tax rate the total is the ticket minimum itself.
    expect(sut.estimateCents).toBe(50_000);
  });
});
