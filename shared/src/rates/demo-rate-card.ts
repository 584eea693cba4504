import { DEFAULT_LEFT_HANDED_CENTS, DEFAULT_LENGTH_CHARGE_ABOVE_IN, type RateCard } from './rate-card.js';

/** Invented prices for Keenroute's demo scenario; not a survey of any market and not advice on what to charge. */
export const DEMO_RATE_CARD: RateCard = {
  name: 'Demo rates (invented for the Keenroute demo; not real prices)',
  currency: 'USD',
  basePerPairCents: {
    beveled: { straight: 3000, curved: 3400, thinning: 3200, blending: 3200, chunker: 3200 },
    convex: { straight: 4200, curved: 4600, thinning: 4400, blending: 4400, chunker: 4400 },
    'semi-convex': { straight: 3800, curved: 4200, thinning: 4000, blending: 4000, chunker: 4000 },
    serrated: { straight: 3200, curved: 3600, thinning: 3400, blending: 3400, chunker: 3400 },
  },
  lengthCharge: { aboveIn: DEFAULT_LENGTH_CHARGE_ABOVE_IN, perPairCents: 500 },
  leftHandedCents: DEFAULT_LEFT_HANDED_CENTS,
  addOnCents: {
    'inside-edge-hone': 1500,
    'tension-adjustment': 500,
    'bumper-replacement': 300,
    'tip-realignment': 1000,
    'set-screw-replacement': 400,
    'blade-polish': 800,
  },
  tripChargeCents: 1000,
  ticketMinimumCents: 2500,
  multiPairDiscounts: [
    { minPairs: 5, discountBp: 500 },
    { minPairs: 10, discountBp: 1000 },
  ],
  servicesTaxable: true,
};
