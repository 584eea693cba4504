import { Badge } from '@mantine/core';
import { formatDate, formatDateTime } from '@/lib/format';
import type { TeamMember } from '../types';

export function lastSignIn(member: TeamMember): string {
  return member.lastSignInAt ? formatDateTime(member.lastSignInAt) : 'Never';
}

export function added(member: TeamMember): string {
  return formatDate(member.createdAt);
}

export function YouBadge() {
  return (
    <Badge size="xs" variant="filled" color="brass" radius="sm" ml={6}>
      You
    </Badge>
  );
}
