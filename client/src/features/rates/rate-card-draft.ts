import {
  ADD_ON_CODES,
  DEFAULT_CURRENCY,
  DISCOUNT_MAX_BP,
  EDGE_TYPES,
  LENGTH_MAX_IN,
  LENGTH_MIN_IN,
  PRICE_MAX_CENTS,
  PRICE_MIN_CENTS,
  TICKET_LINES_MAX,
  TOOL_KINDS,
  currencyDigits,
  formatMoney,
  parseMoney,
  validateCurrency,
  type AddOnCode,
  type EdgeType,
  type RateCard,
  type RateCardProblem,
  type ToolKind,
} from '@keenroute/shared';
import { upperFirst } from '@/lib/format';

/** A number input's value: a number, or its text while it is typed ("", "-"). */
export type InputNumber = number | string;

export interface DiscountTierDraft {
  /** Keeps a row's inputs with it when a row above is removed. */
  key: string;
  minPairs: InputNumber;
  discountPercent: InputNumber;
}

/**
 * The rate card as the form holds it. The keys are the card's own, so a rule's `field` is the form's path; the
 * amounts are in major units (dollars) as typed, and discounts in per cent.
 */
export interface RateCardDraft {
  name: string;
  currency: string;
  basePerPairCents: Record<EdgeType, Record<ToolKind, InputNumber>>;
  lengthCharge: { aboveIn: InputNumber; perPairCents: InputNumber };
  leftHandedCents: InputNumber;
  addOnCents: Record<AddOnCode, InputNumber>;
  tripChargeCents: InputNumber;
  ticketMinimumCents: InputNumber;
  multiPairDiscounts: DiscountTierDraft[];
  servicesTaxable: boolean;
}

let nextTierKey = 0;
export function newTierKey(): string {
  nextTierKey += 1;
  return `tier-${nextTierKey}`;
}

/** The currency the amounts are read in; an unknown code falls back so every amount still gets checked. */
export function draftCurrency(currency: string): string {
  try {
    return validateCurrency(currency);
  } catch {
    return DEFAULT_CURRENCY;
  }
}

export function majorUnits(cents: number, currency: string): number {
  return cents / 10 ** currencyDigits(draftCurrency(currency));
}

/** An amount as typed, in cents by the shared money rules; NaN when it is not an amount, so the card's rules flag it. */
export function toCents(value: InputNumber, currency: string): number {
  const text = String(value).trim();
  const negative = text.startsWith('-');
  try {
    const cents = parseMoney(negative ? text.slice(1) : text, draftCurrency(currency));
    return negative ? -cents : cents;
  } catch {
    return Number.NaN;
  }
}

function toNumber(value: InputNumber): number {
  return typeof value === 'number' ? value : value.trim() === '' ? Number.NaN : Number(value);
}

function mapRecord<K extends string, A, B>(keys: readonly K[], record: Readonly<Record<K, A>>, map: (a: A) => B) {
  return Object.fromEntries(keys.map((key) => [key, map(record[key])])) as Record<K, B>;
}

export function cardToDraft(card: RateCard): RateCardDraft {
  const money = (cents: number) => majorUnits(cents, card.currency);
  return {
    name: card.name,
    currency: card.currency,
    basePerPairCents: mapRecord(EDGE_TYPES, card.basePerPairCents, (row) => mapRecord(TOOL_KINDS, row, money)),
    lengthCharge: { aboveIn: card.lengthCharge.aboveIn, perPairCents: money(card.lengthCharge.perPairCents) },
    leftHandedCents: money(card.leftHandedCents),
    addOnCents: mapRecord(ADD_ON_CODES, card.addOnCents, money),
    tripChargeCents: money(card.tripChargeCents),
    ticketMinimumCents: money(card.ticketMinimumCents),
    multiPairDiscounts: card.multiPairDiscounts.map((tier) => ({
      key: newTierKey(),
      minPairs: tier.minPairs,
      discountPercent: tier.discountBp / 100,
    })),
    servicesTaxable: card.servicesTaxable,
  };
}

/** The card the draft stands for; anything that is not a number becomes NaN for rateCardProblems to report. */
export function draftToCard(draft: RateCardDraft): RateCard {
  const cents = (value: InputNumber) => toCents(value, draft.currency);
  return {
    name: draft.name.trim(),
    currency: draft.currency,
    basePerPairCents: mapRecord(EDGE_TYPES, draft.basePerPairCents, (row) => mapRecord(TOOL_KINDS, row, cents)),
    lengthCharge: {
      aboveIn: toNumber(draft.lengthCharge.aboveIn),
      perPairCents: cents(draft.lengthCharge.perPairCents),
    },
    leftHandedCents: cents(draft.leftHandedCents),
    addOnCents: mapRecord(ADD_ON_CODES, draft.addOnCents, cents),
    tripChargeCents: cents(draft.tripChargeCents),
    ticketMinimumCents: cents(draft.ticketMinimumCents),
    multiPairDiscounts: draft.multiPairDiscounts.map((tier) => ({
      minPairs: toNumber(tier.minPairs),
      // Per cent with two decimals at most, so the product is whole basis points.
      discountBp: Math.round(toNumber(tier.discountPercent) * 100),
    })),
    servicesTaxable: draft.servicesTaxable,
  };
}

const PRICE_FIELD =
  /^(basePerPairCents\.|addOnCents\.|lengthCharge\.perPairCents$|leftHandedCents$|tripChargeCents$|ticketMinimumCents$)/;

/** "multiPairDiscounts[1].discountBp" (the rule's field) → "multiPairDiscounts.1.discountPercent" (the form's path). */
export function formPath(field: string): string {
  return field.replace(/\[(\d+)\]/g, '.$1').replace(/\.discountBp$/, '.discountPercent');
}

/** The rule's message in the form's terms: dollars and per cent rather than cents and basis points. */
export function problemMessage(problem: RateCardProblem, currency: string): string {
  const { field, message } = problem;
  const aboutTheValue = message.startsWith(field);
  if (PRICE_FIELD.test(field)) {
    const money = (cents: number) => formatMoney(cents, draftCurrency(currency));
    return `Enter an amount from ${money(PRICE_MIN_CENTS)} to ${money(PRICE_MAX_CENTS)}.`;
  }
  if (field === 'lengthCharge.aboveIn') {
    return `Enter a shear length from ${LENGTH_MIN_IN} to ${LENGTH_MAX_IN} inches, in quarter inches.`;
  }
  if (field.endsWith('.minPairs') && aboutTheValue)
    return `Enter a whole number of pairs from 2 to ${TICKET_LINES_MAX}.`;
  if (field.endsWith('.discountBp') && aboutTheValue) {
    return `Enter a discount from 0 % to ${DISCOUNT_MAX_BP / 100} %, at most two decimals.`;
  }
  return upperFirst(message);
}

/** Problems (from the shared rules or a server's 400) as the form's errors, one message per input. */
export function draftErrors(problems: readonly RateCardProblem[], currency: string): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const problem of problems) {
    const path = formPath(problem.field);
    const message = problemMessage(problem, currency);
    errors[path] = errors[path] && errors[path] !== message ? `${errors[path]} ${message}` : message;
  }
  return errors;
}

/** A 400's `fields` ({ 'card.tripChargeCents': [...] }) as rate-card problems. */
export function serverProblems(fields: Record<string, string[]>): RateCardProblem[] {
  return Object.entries(fields).flatMap(([key, messages]) =>
    messages.map((message) => ({ field: key.replace(/^card\.?/, ''), message })),
  );
}
