import type { BillingMode, OpeningHours, StopKind, Weekday } from '@keenroute/shared';

export interface Ref {
  id: string;
  name: string;
}

export interface Page<T> {
  items: T[];
  total: number;
}

/** How the stop's pin was set: by the geocoder, picked from its candidates, typed in, or not yet. */
export type GeocodeStatus = 'none' | 'found' | 'picked' | 'manual' | 'ambiguous' | 'failed';

/** One stop as lists show it; next due and days overdue are worked out by the server from the visits. */
export interface StopSummary {
  id: string;
  name: string;
  kind: StopKind;
  street: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
  latitude: number | null;
  longitude: number | null;
  geocodeStatus: GeocodeStatus;
  phone: string | null;
  email: string | null;
  cadenceWeeks: number;
  billingMode: BillingMode;
  assignedSharpener: Ref | null;
  active: boolean;
  lastVisitOn: string | null;
  nextDueOn: string;
  /** Days past due (positive), or days still to go (negative). */
  daysOverdue: number;
  customerCount: number;
}

export interface StopDetail extends StopSummary {
  openingHours: OpeningHours;
  closedDates: string[];
  preferredWeekdays: Weekday[];
  taxRateBp: number;
  accessParking: string;
  accessDoor: string;
  accessBestTime: string;
  manager: Ref | null;
  createdAt: string;
  updatedAt: string;
}

export interface GeocodeCandidate {
  label: string;
  latitude: number;
  longitude: number;
}

/** What the geocoder made of the address on a save. */
export interface GeocodeOutcome {
  status: 'found' | 'picked' | 'manual' | 'ambiguous' | 'failed' | 'none' | 'unchanged';
  message: string | null;
  candidates: GeocodeCandidate[];
}

export interface SavedStop extends StopDetail {
  geocoding: GeocodeOutcome;
}

export interface GeocodeSearchResult {
  status: 'found' | 'ambiguous' | 'failed';
  message: string | null;
  candidates: GeocodeCandidate[];
}

/** The body of POST and PATCH /api/stops. */
export interface StopInput {
  name: string;
  kind: StopKind;
  street: string;
  city: string;
  region?: string;
  postalCode?: string;
  country?: string;
  /** Both or neither; on an edit, both null take the pin away. */
  latitude?: number | null;
  longitude?: number | null;
  geocodeChoice?: 'picked';
  phone?: string | null;
  email?: string | null;
  openingHours?: OpeningHours;
  closedDates?: string[];
  cadenceWeeks?: number;
  preferredWeekdays?: Weekday[];
  billingMode?: BillingMode;
  taxRateBp?: number;
  accessParking?: string;
  accessDoor?: string;
  accessBestTime?: string;
  assignedSharpenerId?: string | null;
  managerUserId?: string | null;
  active?: boolean;
}

export interface AccessNotesInput {
  accessParking?: string;
  accessDoor?: string;
  accessBestTime?: string;
}

export interface StopVisit {
  id: string;
  workedOn: string;
  sharpener: Ref | null;
}

export interface RecordVisitInput {
  workedOn: string;
  sharpenerId?: string;
}

export const STOP_SORTS = ['name', 'city', 'kind', 'nextDueOn', 'createdAt'] as const;
export type StopSort = (typeof STOP_SORTS)[number];
export type SortOrder = 'asc' | 'desc';

export const ACTIVE_FILTERS = ['true', 'false', 'all'] as const;
export type ActiveFilter = (typeof ACTIVE_FILTERS)[number];

export const PAGE_SIZES = [10, 25, 50, 100] as const;

/** The stops list as the URL holds it; `sharpener` is a user id. */
export interface StopListParams {
  page: number;
  pageSize: number;
  q: string;
  kind: StopKind | '';
  sharpener: string;
  active: ActiveFilter;
  sort: StopSort;
  order: SortOrder;
}

export interface ComingDueParams {
  /** The Monday of the chosen ISO week. */
  week: string;
  sharpener: string;
  page: number;
  pageSize: number;
}
