import type { AddOnCode, EdgeType, Handedness, ShearUse, ToolKind } from '@keenroute/shared';
import type { SheetStop } from '@/features/route-days/types';

export interface Ref {
  id: string;
  name: string;
}

export const TICKET_KINDS = ['visit', 'walk-up', 'drop-off'] as const;
export type TicketKind = (typeof TICKET_KINDS)[number];

export const TICKET_STATUSES = ['open', 'finished', 'handed-back'] as const;
export type TicketStatus = (typeof TICKET_STATUSES)[number];

export const BENCH_STATUSES = ['waiting', 'on-the-bench', 'ready', 'handed-back'] as const;
export type BenchStatus = (typeof BENCH_STATUSES)[number];

export type Settlement = 'unpaid' | 'paid-on-site' | 'to-invoice';

export const PAYMENT_METHODS = ['cash', 'cheque', 'card-terminal'] as const;
export type PaymentMethod = (typeof PAYMENT_METHODS)[number];

/** Shears a booking named by kind only, still to be found and added at the stop. */
export interface ExpectedShears {
  toolKind: ToolKind;
  edgeType: EdgeType;
  count: number;
}

export type PhotoStage = 'before' | 'after';

export interface TicketShear {
  id: string;
  tagCode: string;
  make: string | null;
  model: string | null;
  lengthIn: number;
  edgeType: EdgeType;
  toolKind: ToolKind;
  handedness: Handedness;
}

/** The server's edge recipe in short lines; the page shows the rules package's full recipe for the same shear. */
export interface LineRecipe {
  steps: string[];
  disassemble: boolean;
  benchMinutes: number;
  cautions: string[];
  notes: string[];
  source: string;
}

export interface TicketLine {
  id: string;
  shear: TicketShear;
  addOns: AddOnCode[];
  priceCents: number;
  overrideCents: number | null;
  overrideReason: string | null;
  effectiveCents: number;
  benchStatus: BenchStatus;
  notes: string | null;
  recipe?: LineRecipe | null;
  photos?: { id: string; stage: PhotoStage | null; url: string }[];
}

export interface TicketPriceSummary {
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  summary: string[];
  taxNote: string;
  currency: string;
}

export interface Payment {
  id: string;
  method: PaymentMethod;
  amountCents: number;
  reference: string | null;
  recordedAt: string;
}

export interface Ticket {
  id: string;
  kind: TicketKind;
  status: TicketStatus;
  customer: { id: string; name: string; phone: string | null; email: string | null };
  stop: Ref | null;
  routeDayId: string | null;
  bookingId?: string | null;
  /** The day of the visit or drop-off. */
  visitDay?: string;
  lines: TicketLine[];
  expected: ExpectedShears[];
  price: TicketPriceSummary;
  payments: Payment[];
  /** What is still owed after the payments, from the server. */
  balanceCents?: number;
  settlement: Settlement;
  notes: string | null;
  createdAt: string;
  finishedAt: string | null;
  handedBackAt: string | null;
}

/** A row of GET /api/tickets. */
export interface TicketSummary {
  id: string;
  kind: TicketKind;
  status: TicketStatus;
  customer: Ref;
  stop: Ref | null;
  routeDayId: string | null;
  visitDay: string;
  lineCount: number;
  totalCents: number;
  settlement: Settlement;
  createdAt: string;
}

export interface TicketListParams {
  day?: string;
  stopId?: string;
  customerId?: string;
  routeDayId?: string;
  status?: TicketStatus;
}

export interface OpenTicketInput {
  customerId: string;
  stopId?: string;
  routeDayId?: string;
  kind: TicketKind;
  notes?: string;
}

/** A pair met for the first time: registered to the ticket's customer as its line is added. */
export interface NewShearInput {
  make?: string;
  model?: string;
  lengthIn: number;
  edgeType: EdgeType;
  toolKind: ToolKind;
  handedness: Handedness;
  use?: ShearUse;
  notes?: string;
}

export type AddLineInput = ({ shearId: string } | { tagCode: string } | { newShear: NewShearInput }) & {
  addOns?: AddOnCode[];
};

/** POST /api/tickets/walk-up: someone new at the stop, registered as its customer with their ticket. */
export interface WalkUpInput {
  stopId: string;
  routeDayId?: string;
  customer: { name: string; phone?: string; email?: string };
}

export interface LineChanges {
  addOns?: AddOnCode[];
  benchStatus?: BenchStatus;
  notes?: string;
}

export interface PaymentInput {
  method: PaymentMethod;
  amountCents: number;
  reference?: string;
}

/** A booking on the day sheet, as the bookings feature reads it. */
export type { SheetBooking } from '@/features/bookings/components/stop-bookings';

export type VisitStop = SheetStop;
