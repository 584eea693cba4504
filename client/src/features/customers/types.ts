/** A reference to another record: its id and the name people know it by. */
export interface Ref {
  id: string;
  name: string;
}

export interface Page<T> {
  items: T[];
  total: number;
}

export type SortOrder = 'asc' | 'desc';

/** A customer as lists show them: a person at a stop who owns shears. */
export interface CustomerSummary {
  id: string;
  name: string;
  email: string | null;
  phone: string | null;
  stop: Ref | null;
  shearCount: number;
  visitNoticeConsent: boolean;
  active: boolean;
  hasAccount: boolean;
}

export interface CustomerStopSpell {
  stop: Ref;
  startedAt: string;
  endedAt: string | null;
}

export interface CustomerDetail extends CustomerSummary {
  notes: string | null;
  user: { id: string; email: string } | null;
  stopHistory: CustomerStopSpell[];
  createdAt: string;
  updatedAt: string;
}

export const CUSTOMER_SORTS = ['name', 'email', 'stop', 'createdAt'] as const;
export type CustomerSort = (typeof CUSTOMER_SORTS)[number];

export interface CustomerListParams {
  page?: number;
  pageSize?: number;
  q?: string;
  stopId?: string;
  active?: boolean;
  sort?: CustomerSort;
  order?: SortOrder;
}

export interface CustomerInput {
  name: string;
  email?: string | null;
  phone?: string | null;
  stopId?: string | null;
  userId?: string | null;
  notes?: string | null;
  visitNoticeConsent?: boolean;
  active?: boolean;
}

export const PAGE_SIZES = [10, 25, 50] as const;
