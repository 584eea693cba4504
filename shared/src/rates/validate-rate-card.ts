import { RuleError } from '../errors.js';
import { DISCOUNT_MAX_BP, DISCOUNT_TIERS_MAX, PRICE_MAX_CENTS, PRICE_MIN_CENTS, TICKET_LINES_MAX } from '../limits.js';
import { isCents, validateCurrency } from '../money.js';
import { EDGE_TYPES, TOOL_KINDS, isValidLength } from '../shears.js';
import { ADD_ON_CODES, type DiscountTier, type RateCard } from './rate-card.js';

export interface RateCardProblem {
  field: string;
  message: string;
}

const RATE_CARD_NAME_MAX = 120;

function record(value: unknown): Record<string, unknown> | undefined {
  return typeof value === 'object' && value !== null && !Array.isArray(value)
    ? (value as Record<string, unknown>)
    : undefined;
}

/** Every problem with an untrusted rate card, so a form can mark all of them at once; empty when it is valid. */
export function rateCardProblems(input: unknown): RateCardProblem[] {
  const problems: RateCardProblem[] = [];
  const add = (field: string, message: string) => problems.push({ field, message });
  const price = (value: unknown, field: string) => {
    if (!isCents(value) || value < PRICE_MIN_CENTS || value > PRICE_MAX_CENTS) {
      add(field, `${field} must be whole cents from ${PRICE_MIN_CENTS} to ${PRICE_MAX_CENTS}; got ${String(value)}.`);
    }
  };

  const card = record(input);
  if (!card) return [{ field: '', message: 'A rate card must be an object.' }];

  if (typeof card.name !== 'string' || card.name.trim() === '' || card.name.length > RATE_CARD_NAME_MAX) {
    add('name', `name must be some text of at most ${RATE_CARD_NAME_MAX} characters.`);
  }
  try {
    validateCurrency(card.currency);
  } catch (error) {
    add('currency', (error as Error).message);
  }

  const base = record(card.basePerPairCents);
  for (const edge of EDGE_TYPES) {
    const row = record(base?.[edge]);
    for (const kind of TOOL_KINDS) price(row?.[kind], `basePerPairCents.${edge}.${kind}`);
  }

  const length = record(card.lengthCharge);
  if (!isValidLength(length?.aboveIn)) {
    add('lengthCharge.aboveIn', 'lengthCharge.aboveIn must be a shear length: quarter inches from 3 to 12.');
  }
  price(length?.perPairCents, 'lengthCharge.perPairCents');
  price(card.leftHandedCents, 'leftHandedCents');

  const addOns = record(card.addOnCents);
  for (const code of ADD_ON_CODES) price(addOns?.[code], `addOnCents.${code}`);
  price(card.tripChargeCents, 'tripChargeCents');
  price(card.ticketMinimumCents, 'ticketMinimumCents');

  if (!Array.isArray(card.multiPairDiscounts) || card.multiPairDiscounts.length > DISCOUNT_TIERS_MAX) {
    add('multiPairDiscounts', `multiPairDiscounts must be a list of at most ${DISCOUNT_TIERS_MAX} tiers.`);
  } else {
    let previous: DiscountTier = { minPairs: 1, discountBp: 0 };
    card.multiPairDiscounts.forEach((raw: unknown, index) => {
      const at = `multiPairDiscounts[${index}]`;
      const tier = record(raw);
      const minPairs = tier?.minPairs;
      const discountBp = tier?.discountBp;
      if (!Number.isInteger(minPairs) || (minPairs as number) < 2 || (minPairs as number) > TICKET_LINES_MAX) {
        add(`${at}.minPairs`, `${at}.minPairs must be a whole number of pairs from 2 to ${TICKET_LINES_MAX}.`);
        return;
      }
      if (!Number.isInteger(discountBp) || (discountBp as number) < 0 || (discountBp as number) > DISCOUNT_MAX_BP) {
        add(`${at}.discountBp`, `${at}.discountBp must be whole basis points from 0 to ${DISCOUNT_MAX_BP}.`);
        return;
      }
      const current = { minPairs: minPairs as number, discountBp: discountBp as number };
      if (current.minPairs <= previous.minPairs && index > 0) {
        add(`${at}.minPairs`, 'Discount tiers must be listed by rising pair count.');
      } else if (current.discountBp < previous.discountBp) {
        add(`${at}.discountBp`, 'A tier for more pairs must not give a smaller discount.');
      }
      previous = current;
    });
  }

  if (typeof card.servicesTaxable !== 'boolean') add('servicesTaxable', 'servicesTaxable must be true or false.');
  return problems;
}

/** A clean copy of a valid rate card; otherwise a RuleError listing every problem. */
export function validateRateCard(input: unknown): RateCard {
  const problems = rateCardProblems(input);
  const first = problems[0];
  if (first) {
    throw new RuleError('invalid-rate-card', problems.map((problem) => problem.message).join(' '), first.field);
  }
  const card = input as RateCard;
  const copyRow = <K extends string>(keys: readonly K[], row: Readonly<Record<K, number>>) =>
    Object.fromEntries(keys.map((key) => [key, row[key]])) as Record<K, number>;
  return {
    name: card.name,
    currency: card.currency,
    basePerPairCents: {
      beveled: copyRow(TOOL_KINDS, card.basePerPairCents.beveled),
      convex: copyRow(TOOL_KINDS, card.basePerPairCents.convex),
      'semi-convex': copyRow(TOOL_KINDS, card.basePerPairCents['semi-convex']),
      serrated: copyRow(TOOL_KINDS, card.basePerPairCents.serrated),
    },
    lengthCharge: { aboveIn: card.lengthCharge.aboveIn, perPairCents: card.lengthCharge.perPairCents },
    leftHandedCents: card.leftHandedCents,
    addOnCents: copyRow(ADD_ON_CODES, card.addOnCents),
    tripChargeCents: card.tripChargeCents,
    ticketMinimumCents: card.ticketMinimumCents,
    multiPairDiscounts: card.multiPairDiscounts.map((tier) => ({
      minPairs: tier.minPairs,
      discountBp: tier.discountBp,
    })),
    servicesTaxable: card.servicesTaxable,
  };
}
