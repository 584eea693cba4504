import { Badge, type BadgeProps } from '@mantine/core';
import type { Role } from '@keenroute/shared';
import { ROLE_LABELS } from '@/config/roles';

const ROLE_COLORS: Record<Role, string> = {
  owner: 'brass',
  office: 'keenTeal',
  sharpener: 'keenTeal',
  client: 'gray',
};

// Table columns shrink to their content's minimum; a badge's word must not be cut to "SH…".
export const BADGE_STYLES = { label: { overflow: 'visible' } } as const;

export function RoleBadge({ role, ...props }: { role: Role } & BadgeProps) {
  return (
    <Badge
      color={ROLE_COLORS[role]}
      variant={role === 'sharpener' ? 'outline' : 'light'}
      radius="sm"
      styles={BADGE_STYLES}
      {...props}
    >
      {ROLE_LABELS[role]}
    </Badge>
  );
}
