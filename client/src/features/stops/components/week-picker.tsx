import { ActionIcon, Button, Group, Stack, Text } from '@mantine/core';
import { IconChevronLeft, IconChevronRight } from '@tabler/icons-react';
import { addDays } from '@keenroute/shared';
import { formatDay, formatShortDay } from '../format';

interface WeekPickerProps {
  /** The Monday of the week shown. */
  week: string;
  thisWeek: string;
  onChange: (monday: string) => void;
}

/** Previous and next week on either side of the week shown, with thumb-sized buttons. */
export function WeekPicker({ week, thisWeek, onChange }: WeekPickerProps) {
  const sunday = addDays(week, 6);
  const label =
    week === thisWeek
      ? 'This week'
      : week === addDays(thisWeek, 7)
        ? 'Next week'
        : week === addDays(thisWeek, -7)
          ? 'Last week'
          : 'Week of';
  return (
    <Group gap="xs" align="center">
      <Group gap="xs" wrap="nowrap" align="center">
        <ActionIcon variant="default" aria-label="Previous week" onClick={() => onChange(addDays(week, -7))}>
          <IconChevronLeft size={22} aria-hidden="true" />
        </ActionIcon>
        <Stack gap={0} align="center" miw={170} style={{ flex: '0 1 auto' }} aria-live="polite">
          <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
            {label}
          </Text>
          <Text fw={600} ta="center">
            {formatShortDay(week)} – {formatDay(sunday)}
          </Text>
        </Stack>
        <ActionIcon variant="default" aria-label="Next week" onClick={() => onChange(addDays(week, 7))}>
          <IconChevronRight size={22} aria-hidden="true" />
        </ActionIcon>
      </Group>
      {week === thisWeek ? null : (
        <Button variant="subtle" onClick={() => onChange(thisWeek)}>
          This week
        </Button>
      )}
    </Group>
  );
}
