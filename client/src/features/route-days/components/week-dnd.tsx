import { Paper, Text } from '@mantine/core';
import {
  closestCorners,
  DndContext,
  DragOverlay,
  KeyboardSensor,
  PointerSensor,
  TouchSensor,
  useSensor,
  useSensors,
  type Announcements,
  type DragEndEvent,
  type DragStartEvent,
} from '@dnd-kit/core';
import { sortableKeyboardCoordinates } from '@dnd-kit/sortable';
import { useState, type ReactNode } from 'react';
import { resolveDrop, stopIdOf } from '../drop';
import { dayTitle } from '../format';
import type { Week } from '../types';
import { whereIs, type StopMove } from '../week-cache';
function nameOf(week: Week, dragId: string | number): string {
  const stopId = stopIdOf(String(dragId));
  return (
    week.days.flatMap((day) => day.stops).find((stop) => stop.stopId === stopId)?.name ??
    week.unplanned.find((stop) => stop.stopId === stopId)?.name ??
    'the stop'
  );
}

function announcements(week: Week): Announcements {
  const describe = (activeId: string | number, overId: string | number | undefined) => {
    const move = overId === undefined ? null : resolveDrop(week, String(activeId), String(overId));
    const day = move ? week.days.find((candidate) => candidate.id === move.dayId) : undefined;
    return move && day ? `${dayTitle(day)} with ${day.sharpener.name}, place ${move.position + 1}` : 'where it was';
  };
  return {
    onDragStart: ({ active }) => `Picked up ${nameOf(week, active.id)}.`,
    onDragOver: ({ active, over }) => `${nameOf(week, active.id)} would go to ${describe(active.id, over?.id)}.`,
    onDragEnd: ({ active, over }) => `${nameOf(week, active.id)} dropped: ${describe(active.id, over?.id)}.`,
    onDragCancel: ({ active }) => `Moving ${nameOf(week, active.id)} was cancelled.`,
  };
}

const screenReaderInstructions = {
  draggable:
    'To move a stop, press space or enter, use the arrow keys to choose its new place, and press space or enter again. Escape cancels. Each stop’s menu also has Move to….',
};

/** One drag-and-drop space for the whole week: the days' lists and the unplanned list, by pointer, touch or keys. */
export function WeekDnd({
  week,
  onMove,
  children,
}: {
  week: Week;
  onMove: (move: StopMove) => void;
  children: ReactNode;
}) {
  const [dragging, setDragging] = useState<string | null>(null);
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 6 } }),
    // A short press before a drag, so a finger can still scroll the page.
    useSensor(TouchSensor, { activationConstraint: { delay: 250, tolerance: 8 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );

  const onDragStart = ({ active }: DragStartEvent) => setDragging(String(active.id));
  const onDragEnd = ({ active, over }: DragEndEvent) => {
    setDragging(null);
    const move = resolveDrop(week, String(active.id), over ? String(over.id) : null);
    if (move) onMove(move);
  };

  return (
    <DndContext
      sensors={sensors}
      collisionDetection={closestCorners}
      onDragStart={onDragStart}
      onDragEnd={onDragEnd}
      onDragCancel={() => setDragging(null)}
      accessibility={{ announcements: announcements(week), screenReaderInstructions }}
    >
      {children}
      <DragOverlay>
        {dragging ? (
          <Paper withBorder shadow="md" radius="md" p="xs" bg="white">
            <Text fw={600} size="sm">
              {nameOf(week, dragging)}
            </Text>
            <Text size="xs" c="dimmed">
              {whereIs(week, stopIdOf(dragging) ?? '') ? 'Moving' : 'Placing'}
            </Text>
          </Paper>
        ) : null}
      </DragOverlay>
    </DndContext>
  );
}
