import { ActionIcon, Group, Loader, Menu, Paper, Stack, Text, ThemeIcon, Tooltip } from '@mantine/core';
import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import {
  IconAlertTriangle,
  IconArrowsMove,
  IconDotsVertical,
  IconLock,
  IconLockOpen,
  IconTrash,
} from '@tabler/icons-react';
import { stopDragId } from '../drop';
import { duration, problemWording, timeRange } from '../format';
import type { RouteDay, RouteDayStop } from '../types';
import { useBoard } from './board-context';

function lockLabel(stop: RouteDayStop): string {
  if (!stop.locked) return `Lock ${stop.name} to this day`;
  return stop.positionLocked
    ? `Unlock ${stop.name} (locked to this day and place)`
    : `Unlock ${stop.name} (locked to this day)`;
}

/** One stop of a route day: place in the order, times, bench minutes, its lock, and what went wrong if anything. */
export function StopRow({ day, stop }: { day: RouteDay; stop: RouteDayStop }) {
  const board = useBoard();
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({
    id: stopDragId(stop.stopId),
    disabled: !board.canMove,
  });
  const placing = board.placingStopId === stop.stopId;
  const locking = board.lockingStopId === stop.stopId;
  const size = board.touch ? 'xl' : 'md';

  return (
    <Paper
      component="li"
      ref={setNodeRef}
      withBorder
      radius="md"
      p={6}
      aria-label={`${stop.position + 1}. ${stop.name}`}
      style={{ transform: CSS.Translate.toString(transform), transition, opacity: isDragging ? 0.4 : 1 }}
    >
      <Group gap={6} wrap="nowrap" align="flex-start">
        {/* The place number is the drag handle: grab it, or focus it and use space and the arrow keys. */}
        {board.canMove ? (
          <ActionIcon
            ref={setActivatorNodeRef}
            variant="filled"
            radius="xl"
            size={size}
            aria-label={`Drag ${stop.name}`}
            style={{ cursor: 'grab', touchAction: 'none', flex: 'none' }}
            {...attributes}
            {...listeners}
          >
            <Text span fw={700} size="sm" aria-hidden="true">
              {stop.position + 1}
            </Text>
          </ActionIcon>
        ) : (
          <ThemeIcon radius="xl" size={size} aria-hidden="true" style={{ flex: 'none' }}>
            <Text span fw={700} size="sm">
              {stop.position + 1}
            </Text>
          </ThemeIcon>
        )}
        <Stack gap={0} style={{ flex: 1, minWidth: 0 }}>
          <Text fw={600} size="sm" lineClamp={2}>
            {stop.name}
          </Text>
          <Text size="xs" c="dimmed">
            {stop.city}
          </Text>
          {placing ? (
            <Group gap={6}>
              <Loader size="xs" />
              <Text size="xs" c="dimmed">
                Working out the times…
              </Text>
            </Group>
          ) : (
            <Text size="xs">
              {timeRange(stop.arrival, stop.leave)} · {duration(stop.benchMinutes)} bench
            </Text>
          )}
          {stop.problem ? (
            <Group gap={4} wrap="nowrap" mt={2} align="flex-start">
              <IconAlertTriangle
                size={14}
                color="var(--mantine-color-red-7)"
                aria-hidden="true"
                style={{ flex: 'none' }}
              />
              <Text size="xs" fw={600} c="red.7">
                {problemWording(stop.problem)}
              </Text>
            </Group>
          ) : null}
        </Stack>
        <Stack gap={2} style={{ flex: 'none' }}>
          {board.canMove ? (
            <Tooltip label={lockLabel(stop)} withArrow>
              <ActionIcon
                size={size}
                variant={stop.locked ? 'light' : 'subtle'}
                color={stop.locked ? 'brass' : 'gray'}
                aria-label={lockLabel(stop)}
                aria-pressed={stop.locked}
                loading={locking}
                onClick={() => board.toggleLock(day, stop)}
              >
                {stop.locked ? (
                  <IconLock size={18} aria-hidden="true" />
                ) : (
                  <IconLockOpen size={18} aria-hidden="true" />
                )}
              </ActionIcon>
            </Tooltip>
          ) : stop.locked ? (
            <IconLock size={18} aria-label="Locked" color="var(--mantine-color-brass-6)" />
          ) : null}
          {board.canMove ? (
            <Menu position="bottom-end" withinPortal>
              <Menu.Target>
                <ActionIcon size={size} variant="subtle" color="gray" aria-label={`More for ${stop.name}`}>
                  <IconDotsVertical size={18} aria-hidden="true" />
                </ActionIcon>
              </Menu.Target>
              <Menu.Dropdown>
                <Menu.Item leftSection={<IconArrowsMove size={18} />} onClick={() => board.askMove(stop.stopId)}>
                  Move to…
                </Menu.Item>
                {board.canManage ? (
                  <Menu.Item color="red" leftSection={<IconTrash size={18} />} onClick={() => board.takeOff(day, stop)}>
                    Take off the day
                  </Menu.Item>
                ) : null}
              </Menu.Dropdown>
            </Menu>
          ) : null}
        </Stack>
      </Group>
    </Paper>
  );
}
