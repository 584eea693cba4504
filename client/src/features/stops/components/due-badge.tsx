import { Badge, Group, Text } from '@mantine/core';
import { BADGE_STYLES } from '@/components/role-badge';
import { dueLevel, dueWording, formatDay } from '../format';

const COLORS = { overdue: 'red', soon: 'brass', later: 'gray' } as const;

/** Red once a stop is overdue, brass in the week before it falls due. */
export function DueBadge({ daysOverdue }: { daysOverdue: number }) {
  const level = dueLevel(daysOverdue);
  return (
    <Badge
      color={COLORS[level]}
      variant={level === 'later' ? 'outline' : 'light'}
      radius="sm"
      styles={BADGE_STYLES}
      tt="none"
    >
      {dueWording(daysOverdue)}
    </Badge>
  );
}

/** The due date with its badge, as the list and the stop page show it. */
export function NextDue({ nextDueOn, daysOverdue }: { nextDueOn: string; daysOverdue: number }) {
  return (
    <Group gap={8} wrap="wrap">
      <Text size="sm" span style={{ whiteSpace: 'nowrap' }}>
        {formatDay(nextDueOn)}
      </Text>
      <DueBadge daysOverdue={daysOverdue} />
    </Group>
  );
}
