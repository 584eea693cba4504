import { Button, Group, Modal, NumberInput, Select, Stack, Text } from '@mantine/core';
import { useState } from 'react';
import { dayTitle, stopsWording } from '../format';
import type { Week } from '../types';
import { whereIs, type StopMove } from '../week-cache';

interface MoveStopModalProps {
  week: Week;
  stopId: string | null;
  onClose: () => void;
  onMove: (move: StopMove) => void;
}

/** Move to…: the way to move a stop without dragging (a phone, a screen reader), by day and place in the day. */
export function MoveStopModal({ week, stopId, onClose, onMove }: MoveStopModalProps) {
  const name =
    week.days.flatMap((day) => day.stops).find((stop) => stop.stopId === stopId)?.name ??
    week.unplanned.find((stop) => stop.stopId === stopId)?.name ??
    '';
  return (
    <Modal opened={stopId !== null} onClose={onClose} title={`Move ${name}`} centered>
      {stopId ? <MoveForm key={stopId} week={week} stopId={stopId} onClose={onClose} onMove={onMove} /> : null}
    </Modal>
  );
}

function MoveForm({ week, stopId, onClose, onMove }: MoveStopModalProps & { stopId: string }) {
  const from = whereIs(week, stopId);
  const [dayId, setDayId] = useState<string | null>(from?.day.id ?? week.days[0]?.id ?? null);
  const target = week.days.find((day) => day.id === dayId);
  // Within its own day a stop can go anywhere up to last; elsewhere it may also go after the last one.
  const places = target ? target.stops.length + (from?.day.id === target.id ? 0 : 1) : 1;
  const [place, setPlace] = useState<number | string>(from ? from.index + 1 : places);
  const placeNumber = typeof place === 'number' ? place : Number(place);
  const placeError =
    Number.isInteger(placeNumber) && placeNumber >= 1 && placeNumber <= places
      ? null
      : `Choose a place from 1 to ${places}.`;

  const submit = () => {
    if (!target || placeError) return;
    onMove({ stopId, dayId: target.id, position: placeNumber - 1 });
    onClose();
  };

  return (
    <form
      onSubmit={(event) => {
        event.preventDefault();
        submit();
      }}
      noValidate
    >
      <Stack gap="md">
        <Select
          label="Day"
          data={week.days.map((day) => ({
            value: day.id,
            label: `${dayTitle(day)} · ${day.sharpener.name} (${stopsWording(day.stops.length)})`,
          }))}
          value={dayId}
          onChange={(value) => {
            setDayId(value);
            const next = week.days.find((day) => day.id === value);
            if (next) setPlace(next.stops.length + (from?.day.id === next.id ? 0 : 1));
          }}
          allowDeselect={false}
          comboboxProps={{ withinPortal: true }}
        />
        <NumberInput
          label="Place in the day"
          description={`1 is the first stop; ${places} is last.`}
          min={1}
          max={places}
          allowDecimal={false}
          value={place}
          onChange={setPlace}
          error={placeError}
        />
        <Text size="sm" c="dimmed">
          The stop is locked where you put it, so re-planning keeps it there.
        </Text>
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" disabled={!target || placeError !== null}>
            Move here
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
