import {
  describeShear,
  formatMoney,
  priceTicket,
  taxCents,
  type AddOnCode,
  type RateCard,
  type Shear,
  type TicketPrice,
} from '@keenroute/shared';

export interface PricingLine {
  shear: Shear & { tagCode: string };
  addOns: readonly AddOnCode[];
  overrideCents: number | null;
  overrideReason: string | null;
}

/** What a ticket stores after pricing: the rules' numbers, then the totals with any override applied. */
export interface TicketTotals {
  currency: string;
  servicesTaxable: boolean;
  taxRateBp: number;
  rulesSubtotalCents: number;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  summary: string[];
  taxNote: string;
  /** Per line, in order: priceTicket's line total and its explanation. */
  lines: { priceCents: number; explanation: string }[];
}

/** Prices a ticket's lines with the rules package, then applies overrides (see applyOverrides). */
export function priceLines(
  lines: readonly PricingLine[],
  card: RateCard,
  context: { taxRateBp: number; chargeTrip: boolean },
): TicketTotals {
  const price: TicketPrice = priceTicket(
    lines.map((line) => ({ shear: shapeOf(line.shear), addOns: [...line.addOns] })),
    card,
    context,
  );
  const rules: TicketTotals = {
    currency: price.currency,
    servicesTaxable: price.servicesTaxable,
    taxRateBp: price.taxRateBp,
    rulesSubtotalCents: price.subtotalCents,
    subtotalCents: price.subtotalCents,
    taxCents: price.taxCents,
    totalCents: price.totalCents,
    summary: price.summary,
    taxNote: price.taxNote,
    lines: price.lines.map((line) => ({ priceCents: line.totalCents, explanation: line.explanation })),
  };
  return applyOverrides(rules, lines);
}

/**
 * An override replaces one line's rules price by the amount the owner or office set (Keenroute's rule): the ticket's
 * subtotal moves by the difference, the discount and minimum stay as the rules computed them, tax is taken again on
 * the new subtotal. Without overrides the totals are priceTicket's, to the cent.
 */
export function applyOverrides(
  rules: TicketTotals,
  lines: readonly Pick<PricingLine, 'shear' | 'overrideCents' | 'overrideReason'>[],
): TicketTotals {
  const money = (cents: number) => formatMoney(cents, rules.currency);
  const overridden = lines
    .map((line, index) => ({ line, rulesCents: rules.lines[index]?.priceCents ?? 0 }))
    .filter(({ line }) => line.overrideCents !== null);
  if (overridden.length === 0) return rules;
  const difference = overridden.reduce((sum, { line, rulesCents }) => sum + line.overrideCents! - rulesCents, 0);
  const subtotalCents = Math.max(0, rules.rulesSubtotalCents + difference);
  const tax = rules.servicesTaxable ? taxCents(subtotalCents, rules.taxRateBp) : 0;
  const notes = overridden.map(
    ({ line, rulesCents }) =>
      `price set on ${line.shear.tagCode} (${describeShear(line.shear)}): ${money(rulesCents)} → ${money(line.overrideCents!)}, ${line.overrideReason ?? ''}`,
  );
  const taxLine = rules.servicesTaxable
    ? `tax on ${money(subtotalCents)} after the price set by hand = ${money(tax)}`
    : 'services not taxed (rate card setting)';
  // The rules' own tax line described the old subtotal: it gives way to the recomputed one.
  const summary = [...rules.summary.slice(0, -1), ...notes, taxLine];
  return { ...rules, subtotalCents, taxCents: tax, totalCents: subtotalCents + tax, summary };
}

const shapeOf = (shear: PricingLine['shear']): Shear => ({
  edgeType: shear.edgeType,
  toolKind: shear.toolKind,
  lengthIn: shear.lengthIn,
  handedness: shear.handedness,
  use: shear.use,
});
