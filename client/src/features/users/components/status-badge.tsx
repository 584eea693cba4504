import { Badge } from '@mantine/core';
import { BADGE_STYLES } from '@/components/role-badge';
import type { MemberStatus } from '../types';

const STATUS: Record<MemberStatus, { label: string; color: string }> = {
  invited: { label: 'Invited', color: 'brass' },
  active: { label: 'Active', color: 'keenTeal' },
  deactivated: { label: 'Deactivated', color: 'gray' },
};

export function StatusBadge({ status }: { status: MemberStatus }) {
  const { label, color } = STATUS[status];
  return (
    <Badge color={color} variant={status === 'active' ? 'light' : 'outline'} radius="sm" styles={BADGE_STYLES}>
      {label}
    </Badge>
  );
}
