import { RuleError, shown } from '../errors.js';
import {
  BASIS_POINTS_PER_WHOLE,
  DEFAULT_CURRENCY,
  DEFAULT_LOCALE,
  applyBasisPoints,
  assertCents,
  formatBasisPoints,
  formatMoney,
  sumCents,
  taxCents,
  validateCurrency,
  validateTaxRateBp,
  type Cents,
} from '../money.js';
import { MONEY_MAX_CENTS } from '../limits.js';

/** One invoice line as the rules see it: an amount (a ticket's discount is negative), taxable or not, at a rate. */
export interface InvoiceLineInput {
  amountCents: Cents;
  taxable: boolean;
  taxRateBp: number;
}

/** An invoice-wide discount, as a share of the lines (basis points) or as an amount. */
export type InvoiceDiscountInput = { discountBp: number } | { discountCents: number } | null;

export interface InvoiceTaxGroup {
  taxRateBp: number;
  taxableCents: Cents;
  taxCents: Cents;
}

export interface InvoicePrice {
  linesCents: Cents;
  discountCents: Cents;
  subtotalCents: Cents;
  /** One per distinct rate among the taxable lines, lowest rate first. */
  taxGroups: InvoiceTaxGroup[];
  taxCents: Cents;
  totalCents: Cents;
  /** The discount and each tax group in words, in order. */
  summary: string[];
}

export const INVOICE_LINES_MAX = 1000;

function checkLines(lines: readonly InvoiceLineInput[]): InvoiceLineInput[] {
  const untrusted: unknown = lines;
  if (!Array.isArray(untrusted) || lines.length === 0 || lines.length > INVOICE_LINES_MAX) {
    throw new RuleError('invalid-invoice', `An invoice holds 1 to ${INVOICE_LINES_MAX} lines.`, 'lines');
  }
  return lines.map((line, index) => {
    const at = `lines[${index}]`;
    const amountCents = assertCents(line?.amountCents, `${at}.amountCents`, { min: -MONEY_MAX_CENTS });
    if (typeof line.taxable !== 'boolean') {
      throw new RuleError('invalid-invoice', 'Say whether the line is taxable.', `${at}.taxable`);
    }
    return { amountCents, taxable: line.taxable, taxRateBp: validateTaxRateBp(line.taxRateBp, `${at}.taxRateBp`) };
  });
}

/** A key left undefined or null counts as not given, so a form's empty field does not read as "both kinds". */
const given = (value: unknown) => value !== undefined && value !== null;

function discountOf(discount: InvoiceDiscountInput, linesCents: Cents): Cents {
  if (discount === null || discount === undefined) return 0;
  const raw = discount as { discountBp?: unknown; discountCents?: unknown };
  const hasBp = given(raw.discountBp);
  const hasCents = given(raw.discountCents);
  if (hasBp && hasCents) {
    throw new RuleError('invalid-invoice', 'Give the discount as a share or as an amount, not both.', 'discount');
  }
  if (hasBp) {
    const bp = raw.discountBp;
    if (!Number.isSafeInteger(bp) || (bp as number) < 0 || (bp as number) > BASIS_POINTS_PER_WHOLE) {
      throw new RuleError(
        'invalid-invoice',
        `A discount share is whole basis points from 0 to 10000 (1000 means 10 %); got ${shown(bp)}.`,
        'discountBp',
      );
    }
    return applyBasisPoints(linesCents, bp as number);
  }
  if (!hasCents) return 0;
  const cents = assertCents(raw.discountCents, 'discountCents');
  if (cents > linesCents) {
    throw new RuleError(
      'invalid-invoice',
      `The discount (${cents} cents) cannot be more than the lines add up to (${linesCents} cents).`,
      'discountCents',
    );
  }
  return cents;
}

/**
 * Splits `total` over `weights` in proportion, exactly to the cent: each share rounded down, then the cents left over
 * go to the largest remainders (ties to the earlier weight). The largest remainder (Hamilton) method.
 */
export function spreadCents(total: Cents, weights: readonly Cents[]): Cents[] {
  const whole = sumCents(weights);
  if (
    !Number.isSafeInteger(total) ||
    total < 0 ||
    weights.some((weight) => !Number.isSafeInteger(weight) || weight < 0)
  ) {
    throw new RuleError(
      'invalid-money',
      'Only whole cents of zero or more can be spread over weights of zero or more.',
    );
  }
  if (whole === 0 || total === 0) return weights.map(() => 0);
  // total × weight can pass 2^53 for large invoices, so the quotas are worked in BigInt to stay exact.
  const shares = weights.map((weight) => {
    const exact = BigInt(total) * BigInt(weight);
    return { floor: Number(exact / BigInt(whole)), remainder: exact % BigInt(whole) };
  });
  let left = total - sumCents(shares.map((share) => share.floor));
  const order = shares
    .map((share, index) => ({ index, remainder: share.remainder }))
    .sort((a, b) => (a.remainder === b.remainder ? a.index - b.index : a.remainder > b.remainder ? -1 : 1));
  const result = shares.map((share) => share.floor);
  for (const { index } of order) {
    if (left <= 0) break;
    result[index]! += 1;
    left -= 1;
  }
  return result;
}

/**
 * Prices an invoice: the lines, the invoice discount taken before tax and spread over the tax groups in proportion,
 * then tax once per rate on the invoice, rounded half-up to the cent (Keenroute's rule: tax is rounded on each
 * invoice, not per line).
 */
export function priceInvoice(
  lines: readonly InvoiceLineInput[],
  discount: InvoiceDiscountInput,
  currency: string = DEFAULT_CURRENCY,
): InvoicePrice {
  validateCurrency(currency);
  const checked = checkLines(lines);
  const money = (cents: Cents) => formatMoney(cents, currency, DEFAULT_LOCALE);
  const linesCents = sumCents(checked.map((line) => line.amountCents));
  if (linesCents < 0 || linesCents > MONEY_MAX_CENTS) {
    throw new RuleError(
      'invalid-invoice',
      `The lines of an invoice must add up to 0 to ${MONEY_MAX_CENTS} cents; they add up to ${linesCents}.`,
      'lines',
    );
  }
  const discountCents = discountOf(discount, linesCents);
  const subtotalCents = linesCents - discountCents;
  const summary: string[] = [];
  if (discountCents > 0) {
    const bp = (discount as { discountBp?: unknown } | null)?.discountBp;
    const share = typeof bp === 'number' ? `${formatBasisPoints(bp)} off ` : 'discount on ';
    summary.push(`${share}${money(linesCents)} = −${money(discountCents)}`);
  }

  // Lines grouped by how they are taxed: one group per rate of the taxable lines (lowest first), then the untaxed.
  const rates = [...new Set(checked.filter((line) => line.taxable).map((line) => line.taxRateBp))].sort(
    (a, b) => a - b,
  );
  const groups = [
    ...rates.map((rate) => ({ label: `taxed at ${formatBasisPoints(rate)}`, taxRateBp: rate })),
    { label: 'not taxed', taxRateBp: null },
  ].map((group) => ({
    ...group,
    cents: sumCents(
      checked
        .filter((line) =>
          group.taxRateBp === null ? !line.taxable : line.taxable && line.taxRateBp === group.taxRateBp,
        )
        .map((line) => line.amountCents),
    ),
  }));
  // A ticket's discount line is negative but never outweighs its own ticket, so a group below zero is a mistake.
  for (const group of groups) {
    if (group.cents < 0) {
      throw new RuleError(
        'invalid-invoice',
        `The lines ${group.label} add up to less than zero (${money(group.cents)}); a discount line needs the lines it takes off from.`,
        'lines',
      );
    }
  }
  // The invoice discount comes off every group in proportion, so each tax group bears its share of it.
  const discountShares = spreadCents(
    discountCents,
    groups.map((group) => group.cents),
  );
  const taxGroups = rates.map((taxRateBp, index): InvoiceTaxGroup => {
    const taxableCents = groups[index]!.cents - discountShares[index]!;
    return { taxRateBp, taxableCents, taxCents: taxCents(taxableCents, taxRateBp) };
  });
  for (const group of taxGroups) {
    summary.push(
      `tax ${formatBasisPoints(group.taxRateBp)} on ${money(group.taxableCents)} = ${money(group.taxCents)}`,
    );
  }
  const untaxedCents = groups.at(-1)!.cents - discountShares.at(-1)!;
  if (untaxedCents !== 0) summary.push(`not taxed: ${money(untaxedCents)}`);
  const tax = sumCents(taxGroups.map((group) => group.taxCents));
  return {
    linesCents,
    discountCents,
    subtotalCents,
    taxGroups,
    taxCents: tax,
    totalCents: subtotalCents + tax,
    summary,
  };
}
