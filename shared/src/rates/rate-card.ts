import type { Cents } from '../money.js';
import type { EdgeType, ToolKind } from '../shears.js';

/** Add-on services a ticket line may carry besides the sharpening itself (trade terms). */
export const ADD_ON_CODES = [
  'inside-edge-hone',
  'tension-adjustment',
  'bumper-replacement',
  'tip-realignment',
  'set-screw-replacement',
  'blade-polish',
] as const;
export type AddOnCode = (typeof ADD_ON_CODES)[number];

export const ADD_ON_LABELS: Readonly<Record<AddOnCode, string>> = {
  'inside-edge-hone': 'inside-edge hone',
  'tension-adjustment': 'tension/pivot adjustment',
  'bumper-replacement': 'bumper or silencer replacement',
  'tip-realignment': 'tip realignment',
  'set-screw-replacement': 'set-screw replacement',
  'blade-polish': 'blade polish',
};

export function isAddOnCode(value: unknown): value is AddOnCode {
  return typeof value === 'string' && (ADD_ON_CODES as readonly string[]).includes(value);
}

/** From this many pairs on one ticket, this much off the shear lines. */
export interface DiscountTier {
  minPairs: number;
  discountBp: number;
}

/** The price list. Every amount is integer cents of `currency`. */
export interface RateCard {
  name: string;
  currency: string;
  /** Sharpening one pair, by edge type and tool kind. */
  basePerPairCents: Readonly<Record<EdgeType, Readonly<Record<ToolKind, Cents>>>>;
  /** Added per pair longer than `aboveIn` inches. */
  lengthCharge: { aboveIn: number; perPairCents: Cents };
  /** Added per left-handed pair; 0 by default (same price). */
  leftHandedCents: Cents;
  addOnCents: Readonly<Record<AddOnCode, Cents>>;
  /** Charged once per stop visit, on the ticket the visit says carries it. */
  tripChargeCents: Cents;
  /** A ticket's shear work (after discount) is raised to at least this. */
  ticketMinimumCents: Cents;
  /** Ascending by minPairs; the highest tier reached applies. */
  multiPairDiscounts: readonly DiscountTier[];
  /** Jurisdictions differ on taxing services: a setting; check local tax rules. */
  servicesTaxable: boolean;
}

/** Shears longer than 7 inches may carry a length charge (PRODUCT default). */
export const DEFAULT_LENGTH_CHARGE_ABOVE_IN = 7;
/** Left-handed shears cost the same unless the owner says otherwise (PRODUCT default). */
export const DEFAULT_LEFT_HANDED_CENTS = 0;

/** Shown wherever tax is set or charged. */
export const TAX_RULES_NOTE =
  'Whether sharpening services are taxable, and at what rate, depends on the jurisdiction: check local tax rules.';
