import { Button, Center, Group, Loader, Modal, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useMediaQuery } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { ApiError } from '@/lib/api-error';
import { useShear } from '../api/get-shear';
import { useCreateShear, useUpdateShear } from '../api/save-shear';
import type { ShearChanges, ShearDetail, ShearInput, ShearSummary } from '../types';
import { CustomerSelect } from './customer-select';
import { ShearFields, type ShearValues } from './shear-fields';
import { ShearRegistered } from './shear-registered';

export interface ShearFormModalProps {
  opened: boolean;
  onClose: () => void;
  /** The customer a new shear belongs to; without one the form asks. */
  customerId?: string;
  /** The shear to edit (a list's summary is enough: the form loads the rest); without one it registers a shear. */
  shear?: ShearSummary | ShearDetail;
  onSaved?: (shear: ShearDetail) => void;
}

function initialValues(shear: ShearDetail | undefined, customerId: string | undefined): ShearValues {
  return {
    customerId: shear?.customer.id ?? customerId ?? null,
    make: shear?.make ?? '',
    model: shear?.model ?? '',
    lengthIn: shear?.lengthIn ?? '',
    edgeType: shear?.edgeType ?? null,
    toolKind: shear?.toolKind ?? null,
    handedness: shear?.handedness ?? 'right',
    use: shear?.use ?? 'hair',
    notes: shear?.notes ?? '',
    status: shear?.status ?? 'in-service',
  };
}

const orNull = (text: string): string | null => (text.trim() ? text.trim() : null);

function toInput(values: ShearValues): ShearInput {
  const input: ShearInput = {
    customerId: values.customerId ?? '',
    lengthIn: Number(values.lengthIn),
    // The form's checks have made sure both are chosen.
    edgeType: values.edgeType ?? 'beveled',
    toolKind: values.toolKind ?? 'straight',
    handedness: values.handedness,
    use: values.use,
  };
  const make = orNull(values.make);
  const model = orNull(values.model);
  const notes = orNull(values.notes);
  if (make) input.make = make;
  if (model) input.model = model;
  if (notes) input.notes = notes;
  return input;
}

function changedFields(values: ShearValues, shear: ShearDetail): ShearChanges {
  const before = initialValues(shear, undefined);
  const changes: ShearChanges = {};
  if (values.make !== before.make) changes.make = orNull(values.make);
  if (values.model !== before.model) changes.model = orNull(values.model);
  if (Number(values.lengthIn) !== before.lengthIn) changes.lengthIn = Number(values.lengthIn);
  if (values.edgeType && values.edgeType !== before.edgeType) changes.edgeType = values.edgeType;
  if (values.toolKind && values.toolKind !== before.toolKind) changes.toolKind = values.toolKind;
  if (values.handedness !== before.handedness) changes.handedness = values.handedness;
  if (values.use !== before.use) changes.use = values.use;
  if (values.notes !== before.notes) changes.notes = orNull(values.notes);
  if (values.status !== before.status) changes.status = values.status;
  return changes;
}

/** Registers a shear (and shows the tag code it gets), or edits one. */
export function ShearFormModal({ opened, onClose, customerId, shear, onSaved }: ShearFormModalProps) {
  // On a phone the form takes the whole screen, so the keyboard leaves room for the fields.
  const narrow = useMediaQuery('(max-width: 36em)', false, { getInitialValueInEffect: false });
  return (
    <Modal
      opened={opened}
      onClose={onClose}
      title={shear ? `Edit ${shear.tagCode}` : 'Register a shear'}
      centered
      size="lg"
      fullScreen={narrow}
    >
      {/* The form mounts with each opening, so it always starts from the shear as it is now. */}
      {shear && !isDetail(shear) ? (
        <FullShearForm id={shear.id} onClose={onClose} onSaved={onSaved} />
      ) : (
        <ShearForm onClose={onClose} customerId={customerId} shear={shear} onSaved={onSaved} />
      )}
    </Modal>
  );
}

const isDetail = (shear: ShearSummary | ShearDetail): shear is ShearDetail => 'history' in shear;

// Editing from a list: the notes are not in the summary, and saving must not guess them.
function FullShearForm({ id, ...rest }: { id: string } & Pick<ShearFormModalProps, 'onClose' | 'onSaved'>) {
  const detail = useShear(id);
  if (detail.data) return <ShearForm shear={detail.data} {...rest} />;
  if (detail.isError) return <Text c="red">{detail.error.message}</Text>;
  return (
    <Center mih={160}>
      <Loader aria-label="Loading the shear" />
    </Center>
  );
}

interface ShearFormProps extends Pick<ShearFormModalProps, 'onClose' | 'customerId' | 'onSaved'> {
  shear?: ShearDetail;
}

function ShearForm({ onClose, customerId, shear, onSaved }: ShearFormProps) {
  const create = useCreateShear();
  const update = useUpdateShear();
  const [registered, setRegistered] = useState<ShearDetail | null>(null);
  const form = useForm<ShearValues>({
    initialValues: initialValues(shear, customerId),
    validate: {
      customerId: (value) => (value ? null : 'Choose whose shear this is.'),
      lengthIn: (value) => (value === '' || Number.isNaN(Number(value)) ? 'Enter the length in inches.' : null),
      edgeType: (value) => (value ? null : 'Choose the edge type.'),
      toolKind: (value) => (value ? null : 'Choose the tool kind.'),
    },
  });

  const onError = (error: Error) => {
    if (!(error instanceof ApiError) || !error.hasFieldErrors) return;
    // The rules name nested fields "shear.lengthIn"; the form's fields are flat.
    const errors: Record<string, string> = {};
    for (const [field, messages] of Object.entries(error.fields)) {
      errors[field.replace(/^shear\./, '')] = messages.join(' ');
    }
    form.setErrors(errors);
  };

  const submit = form.onSubmit((values) => {
    if (!shear) {
      create.mutate(toInput(values), {
        onSuccess: (saved) => {
          onSaved?.(saved);
          setRegistered(saved);
        },
        onError,
      });
      return;
    }
    const changes = changedFields(values, shear);
    if (Object.keys(changes).length === 0) {
      onClose();
      return;
    }
    update.mutate(
      { id: shear.id, changes },
      {
        onSuccess: (saved) => {
          notifications.show({ color: 'keenTeal', title: 'Shear saved', message: `${saved.tagCode} is up to date.` });
          onSaved?.(saved);
          onClose();
        },
        onError,
      },
    );
  });

  if (registered) {
    return (
      <ShearRegistered
        shear={registered}
        onDone={onClose}
        onAnother={() => {
          form.setValues({ ...initialValues(undefined, registered.customer.id), use: registered.use });
          form.resetDirty();
          create.reset();
          setRegistered(null);
        }}
      />
    );
  }

  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="md">
        {!shear && !customerId ? (
          <CustomerSelect
            value={form.values.customerId}
            onChange={(value) => form.setFieldValue('customerId', value)}
            error={form.errors.customerId}
            required
          />
        ) : null}
        {shear ? (
          <Text size="sm" c="dimmed">
            Belongs to {shear.customer.name}. The tag code stays with the shear.
          </Text>
        ) : (
          <Text size="sm" c="dimmed">
            Keenroute gives the shear its tag code when you register it.
          </Text>
        )}
        <ShearFields form={form} editing={Boolean(shear)} />
        <Group justify="flex-end" mt="sm">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={create.isPending || update.isPending}>
            {shear ? 'Save shear' : 'Register shear'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
