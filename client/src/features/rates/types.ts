import type { AddOnCode, Handedness, RateCard, ShearUse, TicketPrice, EdgeType, ToolKind } from '@keenroute/shared';

/** The card in force; version null means nothing is saved yet and the card is the invented demo card. */
export interface RateCardVersion {
  version: number | null;
  card: RateCard;
  savedAt: string | null;
}

export interface SavedRateCard {
  version: number;
  card: RateCard;
  savedAt: string;
}

export interface RateHistory {
  items: SavedRateCard[];
  total: number;
}

export interface QuoteShear {
  edgeType: EdgeType;
  toolKind: ToolKind;
  lengthIn: number;
  handedness: Handedness;
  use?: ShearUse;
}

export interface QuoteRequest {
  lines: { shear: QuoteShear; addOns?: AddOnCode[] }[];
  taxRateBp: number;
  chargeTrip?: boolean;
}

export interface QuoteResponse {
  version: number;
  price: TicketPrice;
}
