import { Button, Group, Modal, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useMediaQuery } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { ShearFields, type ShearValues } from '@/features/shears/components/shear-fields';
import { ApiError } from '@/lib/api-error';
import type { NewShearInput } from '../types';
import { useTicketScreen } from './ticket-context';

const blank: ShearValues = {
  customerId: null,
  make: '',
  model: '',
  lengthIn: '',
  edgeType: null,
  toolKind: null,
  handedness: 'right',
  use: 'hair',
  notes: '',
  status: 'in-service',
};

function toInput(values: ShearValues): NewShearInput {
  const input: NewShearInput = {
    lengthIn: Number(values.lengthIn),
    // The form's checks have made sure both are chosen.
    edgeType: values.edgeType ?? 'beveled',
    toolKind: values.toolKind ?? 'straight',
    handedness: values.handedness,
    use: values.use,
  };
  if (values.make.trim()) input.make = values.make.trim();
  if (values.model.trim()) input.model = values.model.trim();
  if (values.notes.trim()) input.notes = values.notes.trim();
  return input;
}

/** Registers a pair that has no tag yet to the ticket's customer and puts it on the ticket, in one request. */
export function NewShearModal({ opened, onClose }: { opened: boolean; onClose: () => void }) {
  const narrow = useMediaQuery('(max-width: 36em)', false, { getInitialValueInEffect: false });
  const { ticket, saver } = useTicketScreen();
  const [saving, setSaving] = useState(false);
  const form = useForm<ShearValues>({
    initialValues: blank,
    validate: {
      lengthIn: (value) => (value === '' || Number.isNaN(Number(value)) ? 'Enter the length in inches.' : null),
      edgeType: (value) => (value ? null : 'Choose the edge type.'),
      toolKind: (value) => (value ? null : 'Choose the tool kind.'),
    },
  });

  const submit = form.onSubmit(async (values) => {
    const before = new Set(ticket.lines.map((line) => line.shear.id));
    setSaving(true);
    const outcome = await saver.save({ kind: 'add-line', input: { newShear: toInput(values) } }, { showError: false });
    setSaving(false);
    if (!outcome.ok) {
      // The rules name the new shear's fields "newShear.lengthIn"; the form's fields are flat.
      const { error } = outcome;
      if (error instanceof ApiError && error.hasFieldErrors) {
        const errors: Record<string, string> = {};
        for (const [field, messages] of Object.entries(error.fields)) {
          errors[field.replace(/^(newShear|shear)\./, '')] = messages.join(' ');
        }
        form.setErrors(errors);
      } else {
        form.setErrors({ make: error.message });
      }
      return;
    }
    const added = outcome.ticket.lines.find((line) => !before.has(line.shear.id));
    notifications.show({
      color: 'keenTeal',
      title: added ? `Registered ${added.shear.tagCode}` : 'Shear registered',
      message: 'Write this code on the shear’s tag; it is on the ticket now.',
    });
    form.reset();
    onClose();
  });

  return (
    <Modal opened={opened} onClose={onClose} title="New shear" centered size="lg" fullScreen={narrow}>
      <form onSubmit={(event) => void submit(event)} noValidate>
        <Stack gap="md">
          <Text size="sm" c="dimmed">
            For {ticket.customer.name}. Keenroute gives it a tag code when it is saved.
          </Text>
          <ShearFields form={form} editing={false} />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" size="lg" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" size="lg" loading={saving}>
              Save and add
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
