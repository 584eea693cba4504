import { Button, Group, Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { IconPencil } from '@tabler/icons-react';
import { useState } from 'react';
import { showFieldErrors } from '@/lib/form-errors';
import { useUpdateAccessNotes } from '../../api/update-access-notes';
import type { AccessNotesInput, StopDetail } from '../../types';
import { DetailCard } from './detail-card';

const NOTES = [
  { field: 'accessParking', label: 'Parking' },
  { field: 'accessDoor', label: 'Door' },
  { field: 'accessBestTime', label: 'Best time' },
] as const;

type Notes = Required<AccessNotesInput>;

const notesOf = (stop: StopDetail): Notes => ({
  accessParking: stop.accessParking,
  accessDoor: stop.accessDoor,
  accessBestTime: stop.accessBestTime,
});

function NotesForm({ stop, onDone }: { stop: StopDetail; onDone: () => void }) {
  const save = useUpdateAccessNotes();
  const form = useForm<Notes>({ initialValues: notesOf(stop) });
  const submit = form.onSubmit((values) => {
    const notes: Notes = {
      accessParking: values.accessParking.trim(),
      accessDoor: values.accessDoor.trim(),
      accessBestTime: values.accessBestTime.trim(),
    };
    save.mutate(
      { stopId: stop.id, notes },
      {
        onSuccess: () => {
          notifications.show({ color: 'keenTeal', title: 'Access notes saved', message: stop.name });
          onDone();
        },
        onError: (error) => void showFieldErrors(form, error),
      },
    );
  });
  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="sm">
        {NOTES.map(({ field, label }) => (
          <Textarea key={field} label={label} rows={2} maxLength={500} {...form.getInputProps(field)} />
        ))}
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onDone}>
            Cancel
          </Button>
          <Button type="submit" loading={save.isPending}>
            Save notes
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

/** Parking, door and best time: what the sharpener needs on arrival, kept current by whoever is there. */
export function AccessNotesCard({ stop, canEdit }: { stop: StopDetail; canEdit: boolean }) {
  const [editing, setEditing] = useState(false);
  return (
    <DetailCard
      title="Access notes"
      actions={
        canEdit && !editing ? (
          <Button
            variant="subtle"
            leftSection={<IconPencil size={18} />}
            onClick={() => setEditing(true)}
            aria-label="Edit the access notes"
          >
            Edit notes
          </Button>
        ) : null
      }
    >
      {editing ? (
        <NotesForm stop={stop} onDone={() => setEditing(false)} />
      ) : (
        <Stack gap="sm">
          {NOTES.map(({ field, label }) => (
            <div key={field}>
              <Text size="sm" fw={600}>
                {label}
              </Text>
              <Text size="sm" c={stop[field] ? undefined : 'dimmed'} style={{ whiteSpace: 'pre-line' }}>
                {stop[field] || 'Nothing noted yet.'}
              </Text>
            </div>
          ))}
        </Stack>
      )}
    </DetailCard>
  );
}
