import { Alert, Button, Loader, Stack, Text, TextInput } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { IconBuildingStore, IconSearch } from '@tabler/icons-react';
import { useState } from 'react';
import { MIN_SEARCH_LENGTH, usePublicStopSearch } from '../api/search-public-stops';
import { formatBookingDay, formatWindow } from '../format';
import type { PublicStopSummary } from '../types';

function nextDayLine(stop: PublicStopSummary): string {
  const next = stop.nextDays.find((day) => day.open);
  if (!next) return 'No open route day yet: mail-in is open';
  return `Next: ${formatBookingDay(next.day)}, ${formatWindow(next.arrivalWindow)}`;
}

/** Finds the stop by its name or town; each match is one large button. */
export function StopFinder({ onChoose }: { onChoose: (stop: PublicStopSummary) => void }) {
  const [text, setText] = useState('');
  // Waits for a pause in typing, so one search goes out rather than one per letter.
  const [q] = useDebouncedValue(text.trim(), 300);
  const search = usePublicStopSearch(q);
  const stops = search.data?.items ?? [];
  const searching = q.length >= MIN_SEARCH_LENGTH;

  return (
    <Stack gap="sm">
      <TextInput
        label="Stop name or town"
        description="The salon, barbershop or grooming shop where you leave your shears."
        placeholder="Salon name or town"
        leftSection={<IconSearch size={18} aria-hidden="true" />}
        rightSection={search.isFetching ? <Loader size="xs" aria-label="Searching" /> : null}
        value={text}
        onChange={(event) => setText(event.currentTarget.value)}
        size="lg"
        autoComplete="off"
        type="search"
      />
      {searching && search.isError ? (
        <Alert color="red" title="The stops could not be searched">
          {search.error.message}
        </Alert>
      ) : null}
      {searching && search.isSuccess && stops.length === 0 ? (
        <Text c="dimmed">No stop matches “{q}”. Try the town’s name, or fewer letters.</Text>
      ) : null}
      <Stack gap="xs" aria-label="Matching stops" role="list">
        {stops.map((stop) => (
          <div role="listitem" key={stop.id}>
            <Button
              variant="default"
              fullWidth
              h="auto"
              mih={56}
              py="sm"
              justify="flex-start"
              leftSection={<IconBuildingStore size={22} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
              onClick={() => onChoose(stop)}
              styles={{ label: { whiteSpace: 'normal', textAlign: 'left' } }}
            >
              <span>
                <Text component="span" fw={700} display="block">
                  {stop.name}
                </Text>
                <Text component="span" size="sm" c="dimmed" display="block">
                  {stop.city} · {nextDayLine(stop)}
                </Text>
              </span>
            </Button>
          </div>
        ))}
      </Stack>
    </Stack>
  );
}
