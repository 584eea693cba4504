/** Shortest shear accepted, in inches (blade tip to the end of the finger ring). */
export const LENGTH_MIN_IN = 3;
/** Longest shear accepted, in inches. */
export const LENGTH_MAX_IN = 12;
/** Shear lengths are recorded in quarter inches, as the trade measures them. */
export const LENGTH_STEP_IN = 0.25;

/** Most shear lines one ticket may carry: one customer's shears on one visit. */
export const TICKET_LINES_MAX = 60;
/** Most add-on services on one shear line (there are six kinds, each at most once). */
export const ADD_ONS_PER_LINE_MAX = 6;
/** Most pairs the bench-time estimate takes for one stop visit. */
export const PAIRS_PER_VISIT_MAX = 500;

/** Any single price on a rate card, in cents: a base price, charge, add-on, trip charge or minimum. */
export const PRICE_MIN_CENTS = 0;
export const PRICE_MAX_CENTS = 100_000;
/** Largest amount the money helpers accept, in cents; keeps products with basis points exact in doubles. */
export const MONEY_MAX_CENTS = 1_000_000_000;

/** Tax rate range in basis points (1 bp = 0.01 %); 3000 bp = 30 % covers every sales tax and VAT we know of. */
export const TAX_RATE_MIN_BP = 0;
export const TAX_RATE_MAX_BP = 3000;

/** Multi-pair discount: at most this many tiers, each at most this many basis points off. */
export const DISCOUNT_TIERS_MAX = 10;
export const DISCOUNT_MAX_BP = 5000;

/** Bench minutes: upper bound for any one default (setup, per pair, inside-edge honing). */
export const BENCH_MINUTES_MAX = 240;

/** Abrasive steps in one edge recipe, and the size range a step's grade may have, in micrometres. */
export const RECIPE_STEPS_MAX = 12;
export const GRADE_MIN_UM = 0.1;
export const GRADE_MAX_UM = 5000;

/** All limits in one object, for server DTOs and client forms. */
export const LIMITS = {
  lengthMinIn: LENGTH_MIN_IN,
  lengthMaxIn: LENGTH_MAX_IN,
  lengthStepIn: LENGTH_STEP_IN,
  ticketLinesMax: TICKET_LINES_MAX,
  addOnsPerLineMax: ADD_ONS_PER_LINE_MAX,
  pairsPerVisitMax: PAIRS_PER_VISIT_MAX,
  priceMinCents: PRICE_MIN_CENTS,
  priceMaxCents: PRICE_MAX_CENTS,
  moneyMaxCents: MONEY_MAX_CENTS,
  taxRateMinBp: TAX_RATE_MIN_BP,
  taxRateMaxBp: TAX_RATE_MAX_BP,
  discountTiersMax: DISCOUNT_TIERS_MAX,
  discountMaxBp: DISCOUNT_MAX_BP,
  benchMinutesMax: BENCH_MINUTES_MAX,
  recipeStepsMax: RECIPE_STEPS_MAX,
  gradeMinUm: GRADE_MIN_UM,
  gradeMaxUm: GRADE_MAX_UM,
} as const;
