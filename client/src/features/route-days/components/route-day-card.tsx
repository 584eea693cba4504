import { Anchor, Button, Card, Collapse, Group, Stack, Text } from '@mantine/core';
import { useDroppable } from '@dnd-kit/core';
import { SortableContext, verticalListSortingStrategy } from '@dnd-kit/sortable';
import { useDisclosure } from '@mantine/hooks';
import { IconFileText, IconMap } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { dayDropId, stopDragId } from '../drop';
import { dayTitle } from '../format';
import type { RouteDay } from '../types';
import { DayTotals } from './day-totals';
import { RouteDayMap } from './map/route-day-map';
import { StopRow } from './stop-row';

interface RouteDayCardProps {
  day: RouteDay;
  /** The sharpener's name as the card's heading in a list by day; the week grid names rows and columns itself. */
  showSharpener: boolean;
  isToday?: boolean;
}

/** One sharpener's day: totals, the stops in order (sortable), the day sheet link and a small map. */
export function RouteDayCard({ day, showSharpener, isToday = false }: RouteDayCardProps) {
  const [mapShown, map] = useDisclosure(false);
  const { setNodeRef, isOver } = useDroppable({ id: dayDropId(day.id) });
  const name = `${dayTitle(day)} with ${day.sharpener.name}`;

  return (
    <Card
      component="section"
      withBorder
      radius="md"
      padding="sm"
      aria-label={name}
      style={isToday ? { borderColor: 'var(--mantine-color-brass-6)', borderWidth: 2 } : undefined}
    >
      <Stack gap={6}>
        <Group justify={showSharpener ? 'space-between' : 'flex-end'} gap={4} wrap="nowrap">
          {showSharpener ? <Text fw={700}>{day.sharpener.name}</Text> : null}
          <Anchor
            component={Link}
            to={paths.routeDays.sheet.getHref(day.id)}
            size="sm"
            aria-label={`Day sheet for ${name}`}
          >
            <Group gap={4} wrap="nowrap">
              <IconFileText size={16} aria-hidden="true" />
              Day sheet
            </Group>
          </Anchor>
        </Group>
        <DayTotals day={day} />
        <SortableContext
          id={dayDropId(day.id)}
          items={day.stops.map((stop) => stopDragId(stop.stopId))}
          strategy={verticalListSortingStrategy}
        >
          <Stack
            ref={setNodeRef}
            component="ol"
            gap={6}
            p={0}
            m={0}
            mih={48}
            aria-label={`Stops on ${name}`}
            style={{
              listStyle: 'none',
              borderRadius: 8,
              outline: isOver ? '2px dashed var(--mantine-color-keenTeal-4)' : undefined,
            }}
          >
            {day.stops.map((stop) => (
              <StopRow key={stop.stopId} day={day} stop={stop} />
            ))}
            {day.stops.length === 0 ? (
              <Text component="li" size="sm" c="dimmed" ta="center" py="sm">
                No stops yet
              </Text>
            ) : null}
          </Stack>
        </SortableContext>
        {day.stops.length > 0 ? (
          <>
            <Button
              variant="subtle"
              size="xs"
              leftSection={<IconMap size={16} aria-hidden="true" />}
              onClick={map.toggle}
              aria-expanded={mapShown}
              style={{ alignSelf: 'flex-start' }}
            >
              {mapShown ? 'Hide the map' : 'Show the map'}
            </Button>
            <Collapse expanded={mapShown}>
              {mapShown ? <RouteDayMap start={day.start} stops={day.stops} label={name} /> : null}
            </Collapse>
          </>
        ) : null}
      </Stack>
    </Card>
  );
}
