import { Badge } from '@mantine/core';
import { SHEAR_STATUS_LABELS, type ShearStatus } from '@keenroute/shared';
import { upperFirst } from '@/lib/format';
import { STATUS_COLORS } from '../labels';

// A badge keeps its whole word: in a narrow table cell Mantine would otherwise cut it to "IN SE...".
const WHOLE = { root: { flexShrink: 0 }, label: { overflow: 'visible' } } as const;

export function ShearStatusBadge({ status }: { status: ShearStatus }) {
  return (
    <Badge
      color={STATUS_COLORS[status]}
      variant={status === 'in-service' ? 'light' : 'outline'}
      radius="sm"
      styles={WHOLE}
    >
      {upperFirst(SHEAR_STATUS_LABELS[status])}
    </Badge>
  );
}

/** Right-handed is the default; only the exception earns a badge. */
export function LeftHandedBadge() {
  return (
    <Badge color="brass" variant="light" radius="sm" styles={WHOLE}>
      Left-handed
    </Badge>
  );
}
