import { RuleError } from '../errors.js';
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

function discountOf(discount: InvoiceDiscountInput, linesCents: Cents): Cents {
  if (discount === null || discount === undefined) return 0;
  const hasBp = 'discountBp' in discount;
  const hasCents = 'discountCents' in discount;
  if (hasBp && hasCents) {
    throw new RuleError('invalid-invoice', 'Give the discount as a share or as an amount, not both.', 'discount');
  }
  if (hasBp) {
    const bp = discount.discountBp;
    if (!Number.isSafeInteger(bp) || bp < 0 || bp > BASIS_POINTS_PER_WHOLE) {
      throw new RuleError(
        'invalid-invoice',
        `A discount share is whole basis points from 0 to 10000 (1000 means 10 %); got ${String(bp)}.`,
        'discountBp',
      );
    }
    return applyBasisPoints(Math.max(0, linesCents), bp);
  }
  const cents = assertCents((discount as { discountCents: unknown }).discountCents, 'discountCents');
  if (cents > Math.max(0, linesCents)) {
    throw new RuleError('invalid-invoice', 'The discount cannot be more than the lines add up to.', 'discountCents');
  }
  return cents;
}

/**
 * Splits `total` over `weights` in proportion, exactly to the cent: each share rounded down, then the cents left over
 * go to the largest remainders (ties to the earlier weight). The largest remainder (Hamilton) method.
 */
export function spreadCents(total: Cents, weights: readonly Cents[]): Cents[] {
  const whole = sumCents(weights);
  if (whole <= 0 || total === 0) return weights.map(() => 0);
  const shares = weights.map((weight) => {
    const exact = total * weight;
    return { floor: Math.floor(exact / whole), remainder: exact % whole };
  });
  let left = total - sumCents(shares.map((share) => share.floor));
  const order = shares
    .map((share, index) => ({ index, remainder: share.remainder }))
    .sort((a, b) => b.remainder - a.remainder || a.index - b.index);
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
  const checked = checkLines(lines);
  const money = (cents: Cents) => formatMoney(cents, currency, DEFAULT_LOCALE);
  const linesCents = sumCents(checked.map((line) => line.amountCents));
  if (linesCents < 0) {
    throw new RuleError('invalid-invoice', 'The lines of an invoice cannot add up to less than zero.', 'lines');
  }
  const discountCents = discountOf(discount, linesCents);
  const subtotalCents = linesCents - discountCents;
  const summary: string[] = [];
  if (discountCents > 0) {
    const share =
      discount && 'discountBp' in discount ? `${formatBasisPoints(discount.discountBp)} off ` : 'discount on ';
    summary.push(`${share}${money(linesCents)} = −${money(discountCents)}`);
  }

  // The discount comes off every line in proportion, so each tax group bears its share of it.
  const rates = [...new Set(checked.filter((line) => line.taxable).map((line) => line.taxRateBp))].sort(
    (a, b) => a - b,
  );
  const groupLines = rates.map((rate) =>
    sumCents(checked.filter((line) => line.taxable && line.taxRateBp === rate).map((line) => line.amountCents)),
  );
  const untaxed = sumCents(checked.filter((line) => !line.taxable).map((line) => line.amountCents));
  const weights = [...groupLines, untaxed].map((cents) => Math.max(0, cents));
  const discountShares = spreadCents(discountCents, weights);
  const taxGroups = rates.map((taxRateBp, index) => {
    const taxableCents = Math.max(0, groupLines[index]! - discountShares[index]!);
    return { taxRateBp, taxableCents, taxCents: taxCents(taxableCents, taxRateBp) };
  });
  for (const group of taxGroups) {
    summary.push(
      `tax ${formatBasisPoints(group.taxRateBp)} on ${money(group.taxableCents)} = ${money(group.taxCents)}`,
    );
  }
  if (untaxed !== 0) summary.push(`not taxed: ${money(untaxed - discountShares[rates.length]!)}`);
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
