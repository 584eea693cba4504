import { Alert, Button, Group, List, Stack } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useStopForm } from '../hooks/use-stop-form';
import type { GeocodeOutcome, StopDetail } from '../types';
import { AccessNoteFields, AssignmentFields } from './form/access-fields';
import { LocationSection } from './form/location-section';
import { OpeningHoursEditor } from './form/opening-hours-editor';
import { ContactFields, PlaceFields } from './form/place-fields';
import { BillingFields, ClosedDatesField, VisitFields } from './form/visit-billing-fields';

interface StopFormProps {
  /** The stop being edited; none when adding one. */
  stop?: StopDetail;
  /** What the geocoder said on the save that led here. */
  initialGeocoding?: GeocodeOutcome;
}

/** One form for adding and editing a stop. */
export function StopForm({ stop, initialGeocoding }: StopFormProps) {
  const state = useStopForm({ stop, initialGeocoding });
  const { submit, saving, problem } = state;
  const cancelHref = stop ? paths.stops.detail.getHref(stop.id) : paths.stops.list.getHref();

  return (
    <form onSubmit={submit} noValidate aria-label={stop ? `Edit ${stop.name}` : 'New stop'}>
      <Stack gap="md" maw={960}>
        {problem ? (
          <Alert color="red" icon={<IconAlertTriangle size={20} />} title="The stop was not saved" role="alert">
            {problem.message}
            {problem.details.length > 0 ? (
              <List size="sm" mt="xs">
                {problem.details.map((detail) => (
                  <List.Item key={detail}>{detail}</List.Item>
                ))}
              </List>
            ) : null}
          </Alert>
        ) : null}
        <PlaceFields state={state} />
        <LocationSection state={state} savedStatus={stop?.geocodeStatus} />
        <ContactFields state={state} />
        <OpeningHoursEditor state={state} />
        <ClosedDatesField state={state} />
        <VisitFields state={state} />
        <BillingFields state={state} />
        <AccessNoteFields state={state} />
        <AssignmentFields state={state} current={stop?.assignedSharpener ?? null} manager={stop?.manager ?? null} />
        <Group justify="flex-end" gap="sm">
          <Button variant="default" component={Link} to={cancelHref} style={{ flex: '1 1 8rem', maxWidth: '14rem' }}>
            Cancel
          </Button>
          <Button type="submit" loading={saving} style={{ flex: '1 1 8rem', maxWidth: '14rem' }}>
            {stop ? 'Save the stop' : 'Add the stop'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
