import {
  EDGE_TYPE_LABELS,
  EDGE_TYPES,
  SHEAR_STATUS_LABELS,
  SHEAR_STATUSES,
  TOOL_KIND_LABELS,
  TOOL_KINDS,
  type ShearStatus,
} from '@keenroute/shared';
import { upperFirst } from '@/lib/format';
import type { ShearHistoryKind, ShearSummary } from './types';

export const EDGE_TYPE_OPTIONS = EDGE_TYPES.map((value) => ({ value, label: upperFirst(EDGE_TYPE_LABELS[value]) }));
export const TOOL_KIND_OPTIONS = TOOL_KINDS.map((value) => ({ value, label: upperFirst(TOOL_KIND_LABELS[value]) }));
export const STATUS_OPTIONS = SHEAR_STATUSES.map((value) => ({ value, label: upperFirst(SHEAR_STATUS_LABELS[value]) }));

export const STATUS_COLORS: Readonly<Record<ShearStatus, string>> = {
  'in-service': 'keenTeal',
  retired: 'gray',
  lost: 'red',
};

export const HISTORY_KIND_LABELS: Readonly<Record<ShearHistoryKind, string>> = {
  registered: 'Registered',
  serviced: 'Serviced',
  status: 'Status changed',
  moved: 'Moved',
  note: 'Note',
};

/** "Corvane Series 7" or "Make not recorded": what people call the pair. */
export function makeAndModel(shear: Pick<ShearSummary, 'make' | 'model'>): string {
  const name = [shear.make, shear.model].filter(Boolean).join(' ');
  return name || 'Make not recorded';
}
