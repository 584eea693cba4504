import {
  formatMoney,
  isRuleError,
  priceTicket,
  type AddOnCode,
  type EdgeType,
  type Handedness,
  type RateCard,
  type TicketLine,
  type TicketPrice,
  type ToolKind,
} from '@keenroute/shared';
import type { InputNumber } from './rate-card-draft';
import type { QuoteRequest } from './types';

/** One shear on the quote, as its inputs hold it. */
export interface QuoteLineDraft {
  key: string;
  edgeType: EdgeType;
  toolKind: ToolKind;
  lengthIn: InputNumber;
  handedness: Handedness;
  addOns: AddOnCode[];
}

export interface QuoteSettings {
  lines: QuoteLineDraft[];
  /** Per cent as typed (8.25). */
  taxPercent: InputNumber;
  chargeTrip: boolean;
}

let nextLineKey = 0;
export function newQuoteLine(edit: Partial<Omit<QuoteLineDraft, 'key'>> = {}): QuoteLineDraft {
  nextLineKey += 1;
  return {
    key: `line-${nextLineKey}`,
    edgeType: 'convex',
    toolKind: 'straight',
    lengthIn: 6.5,
    handedness: 'right',
    addOns: [],
    ...edit,
  };
}

const asNumber = (value: InputNumber) =>
  typeof value === 'number' ? value : value.trim() === '' ? Number.NaN : Number(value);

/** 8.25 % → 825 bp; per cent takes two decimals at most, so this is exact. */
export function taxRateBp(taxPercent: InputNumber): number {
  return Math.round(asNumber(taxPercent) * 100);
}

export function quoteRequest(settings: QuoteSettings): QuoteRequest {
  return {
    lines: settings.lines.map((line) => ({
      shear: {
        edgeType: line.edgeType,
        toolKind: line.toolKind,
        lengthIn: asNumber(line.lengthIn),
        handedness: line.handedness,
      },
      addOns: [...line.addOns],
    })),
    taxRateBp: taxRateBp(settings.taxPercent),
    chargeTrip: settings.chargeTrip,
  };
}

export type QuotePreview = { price: TicketPrice; problem: null } | { price: null; problem: string };

/** The ticket priced by the shared rules, or what stops it being priced. */
export function previewQuote(request: QuoteRequest, card: RateCard): QuotePreview {
  try {
    const lines: TicketLine[] = request.lines;
    return {
      price: priceTicket(lines, card, { taxRateBp: request.taxRateBp, chargeTrip: request.chargeTrip }),
      problem: null,
    };
  } catch (error) {
    if (!isRuleError(error)) throw error;
    return { price: null, problem: error.message };
  }
}

/** The figures on which two prices of the same ticket differ, in words; empty when they agree. */
export function quoteDifferences(expected: TicketPrice, actual: TicketPrice): string[] {
  const money = (cents: number) => formatMoney(cents, expected.currency);
  const differences: string[] = [];
  const compare = (label: string, a: number, b: number) => {
    if (a !== b) differences.push(`${label}: ${money(a)} here, ${money(b)} from the server`);
  };
  if (expected.currency !== actual.currency) {
    differences.push(`currency: ${expected.currency} here, ${actual.currency} from the server`);
  }
  if (expected.lines.length !== actual.lines.length) {
    differences.push(`shears: ${expected.lines.length} here, ${actual.lines.length} from the server`);
  }
  expected.lines.forEach((line, index) => {
    const other = actual.lines[index];
    if (other) compare(`shear ${index + 1}`, line.totalCents, other.totalCents);
  });
  compare('shear lines', expected.linesCents, actual.linesCents);
  compare('discount', expected.discount?.cents ?? 0, actual.discount?.cents ?? 0);
  compare('ticket minimum top-up', expected.minimumTopUpCents, actual.minimumTopUpCents);
  compare('trip charge', expected.tripChargeCents, actual.tripChargeCents);
  compare('subtotal', expected.subtotalCents, actual.subtotalCents);
  compare('tax', expected.taxCents, actual.taxCents);
  compare('total', expected.totalCents, actual.totalCents);
  return differences;
}
