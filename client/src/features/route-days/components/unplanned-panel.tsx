import { ActionIcon, Badge, Card, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { useDraggable } from '@dnd-kit/core';
import { CSS } from '@dnd-kit/utilities';
import { IconArrowsMove, IconCircleCheck, IconGripVertical } from '@tabler/icons-react';
import { unplannedDragId } from '../drop';
import { reasonLabel } from '../format';
import type { UnplannedStop } from '../types';
import { useBoard } from './board-context';

/** The week's stops the planner could not place, each with the server's reason in words. */
export function UnplannedPanel() {
  const { week } = useBoard();
  return (
    <Card withBorder radius="md" padding="md" component="section" aria-labelledby="unplanned-title">
      <Title order={2} fz="h4" id="unplanned-title" mb="xs">
        Not planned ({week.unplanned.length})
      </Title>
      {week.unplanned.length === 0 ? (
        <Group gap={6}>
          <IconCircleCheck size={18} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />
          <Text size="sm" c="dimmed">
            Every stop due this week is on a day.
          </Text>
        </Group>
      ) : (
        <Stack component="ul" gap={6} p={0} m={0} style={{ listStyle: 'none' }} aria-label="Stops not planned">
          {week.unplanned.map((stop) => (
            <UnplannedItem key={stop.stopId} stop={stop} />
          ))}
        </Stack>
      )}
    </Card>
  );
}

function UnplannedItem({ stop }: { stop: UnplannedStop }) {
  const board = useBoard();
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, isDragging } = useDraggable({
    id: unplannedDragId(stop.stopId),
    disabled: !board.canManage,
  });
  return (
    <Paper
      component="li"
      ref={setNodeRef}
      withBorder
      radius="md"
      p={6}
      aria-label={stop.name}
      style={{ transform: CSS.Translate.toString(transform), opacity: isDragging ? 0.4 : 1 }}
    >
      <Group gap={4} wrap="nowrap" align="flex-start">
        {board.canManage ? (
          <ActionIcon
            ref={setActivatorNodeRef}
            variant="subtle"
            color="gray"
            size="lg"
            aria-label={`Drag ${stop.name}`}
            style={{ cursor: 'grab', touchAction: 'none' }}
            {...attributes}
            {...listeners}
          >
            <IconGripVertical size={18} aria-hidden="true" />
          </ActionIcon>
        ) : null}
        <Stack gap={2} style={{ flex: 1, minWidth: 0 }} mt={4}>
          <Group gap={6} wrap="wrap">
            <Text fw={600} size="sm">
              {stop.name}
            </Text>
            <Badge color="brass" variant="light" radius="sm" tt="none">
              {reasonLabel(stop.reason)}
            </Badge>
          </Group>
          <Text size="xs" c="dimmed">
            {stop.city}
          </Text>
          <Text size="sm">{stop.reasonText}</Text>
        </Stack>
        {board.canManage && board.week.days.length > 0 ? (
          <ActionIcon
            variant="subtle"
            aria-label={`Place ${stop.name} on a day`}
            onClick={() => board.askMove(stop.stopId)}
          >
            <IconArrowsMove size={20} aria-hidden="true" />
          </ActionIcon>
        ) : null}
      </Group>
    </Paper>
  );
}
