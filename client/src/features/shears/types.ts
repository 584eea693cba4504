import type { EdgeType, Handedness, ShearStatus, ShearUse, ToolKind } from '@keenroute/shared';
import type { Ref, SortOrder } from '@/features/customers/types';

export type { Page, Ref, SortOrder } from '@/features/customers/types';

/** One pair of shears as lists show it, with the tag code that stays with it. */
export interface ShearSummary {
  id: string;
  tagCode: string;
  make: string | null;
  model: string | null;
  lengthIn: number;
  edgeType: EdgeType;
  toolKind: ToolKind;
  handedness: Handedness;
  use: ShearUse;
  status: ShearStatus;
  customer: Ref;
  stop: Ref | null;
  photoCount: number;
  lastServicedOn: string | null;
}

export interface ShearPhoto {
  id: string;
  contentType: string;
  width: number;
  height: number;
  byteSize: number;
  createdAt: string;
}

export const SHEAR_HISTORY_KINDS = ['registered', 'serviced', 'status', 'moved', 'note'] as const;
export type ShearHistoryKind = (typeof SHEAR_HISTORY_KINDS)[number];

export interface ShearHistoryEntry {
  id: string;
  happenedOn: string;
  kind: ShearHistoryKind;
  summary: string;
}

export interface ShearDetail extends ShearSummary {
  notes: string | null;
  photos: ShearPhoto[];
  history: ShearHistoryEntry[];
  createdAt: string;
  updatedAt: string;
}

export const SHEAR_SORTS = ['tagCode', 'make', 'lengthIn', 'edgeType', 'customer', 'createdAt'] as const;
export type ShearSort = (typeof SHEAR_SORTS)[number];

export interface ShearListParams {
  page?: number;
  pageSize?: number;
  q?: string;
  customerId?: string;
  stopId?: string;
  edgeType?: EdgeType;
  toolKind?: ToolKind;
  status?: ShearStatus;
  sort?: ShearSort;
  order?: SortOrder;
}

export interface ShearInput {
  customerId: string;
  make?: string | null;
  model?: string | null;
  lengthIn: number;
  edgeType: EdgeType;
  toolKind: ToolKind;
  handedness?: Handedness;
  use?: ShearUse;
  notes?: string | null;
}

export type ShearChanges = Partial<Omit<ShearInput, 'customerId'>> & { customerId?: string; status?: ShearStatus };
