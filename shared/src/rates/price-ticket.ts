import { RuleError } from '../errors.js';
import { ADD_ONS_PER_LINE_MAX, TICKET_LINES_MAX } from '../limits.js';
import {
  DEFAULT_LOCALE,
  applyBasisPoints,
  formatBasisPoints,
  formatMoney,
  sumCents,
  taxCents,
  validateTaxRateBp,
  type Cents,
} from '../money.js';
import { describeShear, formatLength, validateShear, type Shear } from '../shears.js';
import {
  ADD_ON_LABELS,
  TAX_RULES_NOTE,
  isAddOnCode,
  type AddOnCode,
  type DiscountTier,
  type RateCard,
} from './rate-card.js';
import { validateRateCard } from './validate-rate-card.js';

/** One pair on a ticket and the add-on services done to it. */
export interface TicketLine {
  shear: Shear;
  addOns?: readonly AddOnCode[];
}

export interface PricingContext {
  /** The stop's tax rate in basis points (825 = 8.25 %). */
  taxRateBp: number;
  /** This ticket carries the stop visit's trip charge (one ticket per visit should). */
  chargeTrip?: boolean;
  /** For the explanations' money format. */
  locale?: string;
}

export interface PricePart {
  label: string;
  cents: Cents;
}

export interface PricedLine {
  shear: Shear;
  parts: PricePart[];
  totalCents: Cents;
  /** "convex straight shear, 6.5 in, left-handed: base $42.00 + inside-edge hone $15.00 = $57.00". */
  explanation: string;
}

export interface TicketDiscount extends DiscountTier {
  cents: Cents;
  explanation: string;
}

export interface TicketPrice {
  currency: string;
  lines: PricedLine[];
  pairCount: number;
  /** Sum of the shear lines. */
  linesCents: Cents;
  /** Shear lines plus trip charge, before any discount or minimum. */
  preDiscountSubtotalCents: Cents;
  discount: TicketDiscount | null;
  /** Added when the shear work after discount falls short of the ticket minimum. */
  minimumTopUpCents: Cents;
  tripChargeCents: Cents;
  subtotalCents: Cents;
  servicesTaxable: boolean;
  taxableCents: Cents;
  taxRateBp: number;
  /** Half-up to the cent on the taxable total. */
  taxCents: Cents;
  totalCents: Cents;
  /** The discount, minimum, trip charge and tax in words, in order. */
  summary: string[];
  taxNote: string;
}

function checkLines(lines: readonly TicketLine[]): { shear: Shear; addOns: AddOnCode[] }[] {
  const untrustedLines: unknown = lines;
  if (!Array.isArray(untrustedLines) || lines.length > TICKET_LINES_MAX) {
    throw new RuleError('invalid-ticket', `A ticket holds at most ${TICKET_LINES_MAX} shears.`, 'lines');
  }
  return lines.map((line, index) => {
    const at = `lines[${index}]`;
    const shear = validateShear((line as Partial<TicketLine> | null)?.shear, `${at}.shear`);
    const addOns: readonly AddOnCode[] = line.addOns ?? [];
    const untrustedAddOns: unknown = addOns;
    if (!Array.isArray(untrustedAddOns) || addOns.length > ADD_ONS_PER_LINE_MAX) {
      throw new RuleError('invalid-ticket', `A shear carries at most ${ADD_ONS_PER_LINE_MAX} add-ons.`, `${at}.addOns`);
    }
    addOns.forEach((code: unknown, position) => {
      if (!isAddOnCode(code)) {
        throw new RuleError('invalid-ticket', `Unknown add-on service ${String(code)}.`, `${at}.addOns[${position}]`);
      }
      if (addOns.indexOf(code) !== position) {
        throw new RuleError('invalid-ticket', `${ADD_ON_LABELS[code]} is listed twice.`, `${at}.addOns[${position}]`);
      }
    });
    return { shear, addOns: [...addOns] };
  });
}

function discountTier(tiers: readonly DiscountTier[], pairCount: number): DiscountTier | undefined {
  return tiers.filter((tier) => tier.minPairs <= pairCount && tier.discountBp > 0).at(-1);
}

/** Prices one ticket from a rate card: every line explained, then discount, minimum, trip charge and tax. */
export function priceTicket(lines: readonly TicketLine[], rates: RateCard, context: PricingContext): TicketPrice {
  const card = validateRateCard(rates);
  const taxRateBp = validateTaxRateBp(context.taxRateBp, 'context.taxRateBp');
  const locale = context.locale ?? DEFAULT_LOCALE;
  const money = (cents: Cents) => formatMoney(cents, card.currency, locale);

  const priced = checkLines(lines).map(({ shear, addOns }): PricedLine => {
    const parts: PricePart[] = [{ label: 'base', cents: card.basePerPairCents[shear.edgeType][shear.toolKind] }];
    if (shear.lengthIn > card.lengthCharge.aboveIn && card.lengthCharge.perPairCents > 0) {
      parts.push({ label: `over ${formatLength(card.lengthCharge.aboveIn)}`, cents: card.lengthCharge.perPairCents });
    }
    if (shear.handedness === 'left' && card.leftHandedCents > 0) {
      parts.push({ label: 'left-handed', cents: card.leftHandedCents });
    }
    for (const code of addOns) parts.push({ label: ADD_ON_LABELS[code], cents: card.addOnCents[code] });
    const totalCents = sumCents(parts.map((part) => part.cents));
    const sum = parts.map((part) => `${part.label} ${money(part.cents)}`).join(' + ');
    const explanation = `${describeShear(shear)}: ${sum}${parts.length > 1 ? ` = ${money(totalCents)}` : ''}`;
    return { shear, parts, totalCents, explanation };
  });

  const summary: string[] = [];
  const pairCount = priced.length;
  const linesCents = sumCents(priced.map((line) => line.totalCents));

  const tier = discountTier(card.multiPairDiscounts, pairCount);
  let discount: TicketDiscount | null = null;
  if (tier) {
    const cents = applyBasisPoints(linesCents, tier.discountBp);
    const explanation = `${pairCount} pairs (${tier.minPairs} or more): ${formatBasisPoints(tier.discountBp, locale)} off ${money(linesCents)} = −${money(cents)}`;
    discount = { ...tier, cents, explanation };
    summary.push(explanation);
  }
  const workCents = linesCents - (discount?.cents ?? 0);

  const minimumTopUpCents = pairCount > 0 ? Math.max(0, card.ticketMinimumCents - workCents) : 0;
  if (minimumTopUpCents > 0) {
    summary.push(`ticket minimum ${money(card.ticketMinimumCents)}: + ${money(minimumTopUpCents)}`);
  }
  const tripChargeCents = context.chargeTrip ? card.tripChargeCents : 0;
  if (tripChargeCents > 0) summary.push(`trip charge for the stop visit: + ${money(tripChargeCents)}`);

  const subtotalCents = workCents + minimumTopUpCents + tripChargeCents;
  const taxableCents = card.servicesTaxable ? subtotalCents : 0;
  const tax = taxCents(taxableCents, taxRateBp);
  summary.push(
    card.servicesTaxable
      ? `tax ${formatBasisPoints(taxRateBp, locale)} on ${money(taxableCents)} = ${money(tax)}`
      : 'services not taxed (rate card setting)',
  );

  return {
    currency: card.currency,
    lines: priced,
    pairCount,
    linesCents,
    preDiscountSubtotalCents: linesCents + tripChargeCents,
    discount,
    minimumTopUpCents,
    tripChargeCents,
    subtotalCents,
    servicesTaxable: card.servicesTaxable,
    taxableCents,
    taxRateBp,
    taxCents: tax,
    totalCents: subtotalCents + tax,
    summary,
    taxNote: TAX_RULES_NOTE,
  };
}
