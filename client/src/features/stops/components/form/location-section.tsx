import { Alert, Button, Group, Loader, NumberInput, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconMapPin, IconMapSearch, IconPencil } from '@tabler/icons-react';
import { useState } from 'react';
import { useGeocoderSearch } from '../../api/search-geocoder';
import type { StopFormState } from '../../hooks/use-stop-form';
import { addressQuery } from '../../stop-form-draft';
import type { GeocodeStatus } from '../../types';
import { CandidatePicker } from './candidate-picker';
import { FormSection } from './form-section';

const STATUS_WORDS: Record<GeocodeStatus, string> = {
  none: 'not looked up yet',
  found: 'placed from the address',
  picked: 'picked from the map search',
  manual: 'entered by hand',
  ambiguous: 'the address matched several places',
  failed: 'the address was not found',
};

interface LocationSectionProps {
  state: StopFormState;
  savedStatus?: GeocodeStatus;
}

function SaveWithPin({ state }: { state: StopFormState }) {
  if (!state.picked || !state.editing) return null;
  return (
    <Group>
      <Button type="submit" loading={state.saving} leftSection={<IconMapPin size={18} />}>
        Save with this pin
      </Button>
    </Group>
  );
}

/** Where the stop is on the map: from the geocoder on save, picked from its candidates, or typed in. */
export function LocationSection({ state, savedStatus }: LocationSectionProps) {
  const { form, geocoding, picked, pick } = state;
  const { latitude, longitude } = form.values;
  const [query, setQuery] = useState('');
  const search = useGeocoderSearch(query);
  const hasCoordinateError = Boolean(form.errors.latitude ?? form.errors.longitude);
  const [coordinatesOpen, setCoordinatesOpen] = useState(
    savedStatus === 'manual' || savedStatus === 'failed' || geocoding?.status === 'failed',
  );
  // A save whose lookup failed opens the coordinates, since typing them is the way on.
  const [seenOutcome, setSeenOutcome] = useState(geocoding);
  if (seenOutcome !== geocoding) {
    setSeenOutcome(geocoding);
    if (geocoding?.status === 'failed') setCoordinatesOpen(true);
  }
  const showCoordinates = coordinatesOpen || hasCoordinateError;

  const findOnMap = () => {
    const next = addressQuery(form.getValues());
    if (!form.getValues().street.trim() || !form.getValues().city.trim()) {
      form.setFieldError('street', 'Enter the street and city to find them on the map.');
      return;
    }
    if (next === query) void search.refetch();
    else setQuery(next);
  };

  const hasPin = latitude !== '' && longitude !== '';
  const pinWords = picked
    ? `picked: ${picked.label}`
    : form.isDirty('latitude') || form.isDirty('longitude')
      ? 'not saved yet'
      : savedStatus && STATUS_WORDS[savedStatus];
  return (
    <FormSection
      title="Location"
      description="The pin the route planner drives to. Saving looks the address up when there is no pin."
    >
      <Text size="sm" aria-live="polite">
        {hasPin
          ? `Pin at ${latitude}, ${longitude}${pinWords ? ` (${pinWords})` : ''}.`
          : pinWords === 'not saved yet'
            ? 'No pin: saving takes the old one away.'
            : 'No pin yet.'}
      </Text>

      {geocoding?.status === 'ambiguous' ? (
        <Alert color="brass" title="Pick the right place" icon={<IconMapSearch size={20} />}>
          <Stack gap="sm">
            <Text size="sm">
              The stop is saved without a pin. {geocoding.message ?? 'The address matches more than one place.'}
            </Text>
            <CandidatePicker
              label="Places that match the address"
              candidates={geocoding.candidates}
              picked={picked}
              onPick={pick}
            />
            <SaveWithPin state={state} />
          </Stack>
        </Alert>
      ) : null}

      {geocoding?.status === 'failed' ? (
        <Alert color="brass" title="The stop is saved without a pin" icon={<IconMapPin size={20} />}>
          <Text size="sm">
            {geocoding.message ?? 'The address could not be found on the map.'} Place the pin by entering its
            coordinates below, then save.
          </Text>
        </Alert>
      ) : null}

      <Group gap="sm">
        <Button variant="light" leftSection={<IconMapSearch size={18} />} onClick={findOnMap}>
          Find on map
        </Button>
        <Button
          variant="subtle"
          leftSection={<IconPencil size={18} />}
          onClick={() => setCoordinatesOpen((open) => !open)}
          aria-expanded={showCoordinates}
        >
          Enter coordinates
        </Button>
      </Group>

      {query && search.isFetching ? (
        <Group gap="xs" role="status">
          <Loader size="sm" />
          <Text size="sm">Looking up the address…</Text>
        </Group>
      ) : null}
      {query && search.isError ? (
        <Text size="sm" c="red">
          The map search did not answer: {search.error.message}
        </Text>
      ) : null}
      {query && search.data && !search.isFetching ? (
        search.data.candidates.length > 0 ? (
          <Stack gap="sm">
            <CandidatePicker
              label={search.data.message ?? 'Pick the place that matches'}
              candidates={search.data.candidates}
              picked={picked}
              onPick={pick}
            />
            {geocoding?.status === 'ambiguous' ? null : <SaveWithPin state={state} />}
          </Stack>
        ) : (
          <Text size="sm">
            {search.data.message ?? 'The map search found nothing for this address.'} Enter the coordinates instead.
          </Text>
        )
      ) : null}

      {showCoordinates ? (
        <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="md">
          <NumberInput
            label="Latitude"
            description="From -90 to 90, like 45.52345"
            decimalScale={6}
            hideControls
            inputMode="decimal"
            {...form.getInputProps('latitude')}
          />
          <NumberInput
            label="Longitude"
            description="From -180 to 180, like -122.67621"
            decimalScale={6}
            hideControls
            inputMode="decimal"
            {...form.getInputProps('longitude')}
          />
        </SimpleGrid>
      ) : null}
    </FormSection>
  );
}
