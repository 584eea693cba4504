import {
  Button,
  Center,
  Checkbox,
  Group,
  Loader,
  Modal,
  Stack,
  Switch,
  Text,
  TextInput,
  Textarea,
} from '@mantine/core';
import { isEmail, useForm } from '@mantine/form';
import { useMediaQuery } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { ApiError } from '@/lib/api-error';
import { showFieldErrors } from '@/lib/form-errors';
import { useCustomer } from '../api/get-customer';
import { useCreateCustomer, useUpdateCustomer } from '../api/save-customer';
import type { CustomerDetail, CustomerInput, CustomerSummary } from '../types';
import { StopSelect } from './stop-select';

export interface CustomerFormModalProps {
  opened: boolean;
  onClose: () => void;
  /** The stop a new customer starts at (the form still lets it change). */
  stopId?: string;
  /** The customer to edit (a list's summary is enough: the form loads the rest); without one it adds a customer. */
  customer?: CustomerSummary | CustomerDetail;
  onSaved?: (customer: CustomerDetail) => void;
}

interface CustomerValues {
  name: string;
  email: string;
  phone: string;
  stopId: string | null;
  notes: string;
  visitNoticeConsent: boolean;
  active: boolean;
}

function initialValues(customer: CustomerDetail | undefined, stopId: string | undefined): CustomerValues {
  return {
    name: customer?.name ?? '',
    email: customer?.email ?? '',
    phone: customer?.phone ?? '',
    stopId: customer ? (customer.stop?.id ?? null) : (stopId ?? null),
    notes: customer?.notes ?? '',
    visitNoticeConsent: customer?.visitNoticeConsent ?? false,
    active: customer?.active ?? true,
  };
}

const orNull = (text: string): string | null => (text.trim() ? text.trim() : null);

function toInput(values: CustomerValues): CustomerInput {
  return {
    name: values.name.trim(),
    email: orNull(values.email),
    phone: orNull(values.phone),
    stopId: values.stopId,
    notes: orNull(values.notes),
    visitNoticeConsent: values.visitNoticeConsent,
    active: values.active,
  };
}

// A new customer sends only what was filled in; an edit sends only what changed (null clears a field).
function createBody(input: CustomerInput): CustomerInput {
  const body: CustomerInput = { name: input.name, visitNoticeConsent: input.visitNoticeConsent ?? false };
  if (input.email) body.email = input.email;
  if (input.phone) body.phone = input.phone;
  if (input.stopId) body.stopId = input.stopId;
  if (input.notes) body.notes = input.notes;
  return body;
}

function changedFields(input: CustomerInput, before: CustomerInput): Partial<CustomerInput> {
  const changes: Partial<CustomerInput> = {};
  for (const key of Object.keys(input) as (keyof CustomerInput)[]) {
    if (input[key] !== before[key]) Object.assign(changes, { [key]: input[key] });
  }
  return changes;
}

/** Adds a customer, or edits one: who they are, how to reach them, their stop and visit-notice consent. */
export function CustomerFormModal({ opened, onClose, stopId, customer, onSaved }: CustomerFormModalProps) {
  // On a phone the form takes the whole screen, so the keyboard leaves room for the fields.
  const narrow = useMediaQuery('(max-width: 36em)', false, { getInitialValueInEffect: false });
  return (
    <Modal
      opened={opened}
      onClose={onClose}
      title={customer ? `Edit ${customer.name}` : 'Add a customer'}
      centered
      size="lg"
      fullScreen={narrow}
    >
      {/* The form mounts with each opening, so it always starts from the record as it is now. */}
      {customer && !isDetail(customer) ? (
        <FullCustomerForm id={customer.id} onClose={onClose} onSaved={onSaved} />
      ) : (
        <CustomerForm onClose={onClose} stopId={stopId} customer={customer} onSaved={onSaved} />
      )}
    </Modal>
  );
}

const isDetail = (customer: CustomerSummary | CustomerDetail): customer is CustomerDetail => 'stopHistory' in customer;

// Editing from a list: the notes and history are not in the summary, and saving must not guess them.
function FullCustomerForm({ id, ...rest }: { id: string } & Pick<CustomerFormModalProps, 'onClose' | 'onSaved'>) {
  const detail = useCustomer(id);
  if (detail.data) return <CustomerForm customer={detail.data} {...rest} />;
  if (detail.isError) return <Text c="red">{detail.error.message}</Text>;
  return (
    <Center mih={160}>
      <Loader aria-label="Loading the customer" />
    </Center>
  );
}

interface CustomerFormProps extends Pick<CustomerFormModalProps, 'onClose' | 'stopId' | 'onSaved'> {
  customer?: CustomerDetail;
}

function CustomerForm({ onClose, stopId, customer, onSaved }: CustomerFormProps) {
  const create = useCreateCustomer();
  const update = useUpdateCustomer();
  const form = useForm<CustomerValues>({
    initialValues: initialValues(customer, stopId),
    validate: {
      name: (value) => (value.trim() ? null : 'Enter the customer’s name.'),
      email: (value) => (value.trim() === '' ? null : isEmail('Enter an e-mail address, like name@salon.test.')(value)),
    },
  });

  const onError = (error: Error) => {
    if (showFieldErrors(form, error)) return;
    if (error instanceof ApiError && error.status === 409) form.setFieldError('email', error.message);
  };

  const onSuccess = (saved: CustomerDetail) => {
    notifications.show({
      color: 'keenTeal',
      title: customer ? 'Customer saved' : 'Customer added',
      message: saved.stop ? `${saved.name}, at ${saved.stop.name}.` : `${saved.name}.`,
    });
    onSaved?.(saved);
    onClose();
  };

  const submit = form.onSubmit((values) => {
    const input = toInput(values);
    if (!customer) {
      create.mutate(createBody(input), { onSuccess, onError });
      return;
    }
    const changes = changedFields(input, toInput(initialValues(customer, stopId)));
    if (Object.keys(changes).length === 0) {
      onClose();
      return;
    }
    update.mutate({ id: customer.id, changes }, { onSuccess, onError });
  });

  const movesStop = Boolean(customer?.stop) && form.values.stopId !== (customer?.stop?.id ?? null);
  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="md">
        <TextInput label="Name" required autoComplete="off" data-autofocus {...form.getInputProps('name')} />
        <Group grow align="flex-start" gap="md" wrap="wrap">
          <TextInput
            label="E-mail"
            type="email"
            autoComplete="off"
            miw={200}
            description="For visit notices, receipts and invoices."
            {...form.getInputProps('email')}
          />
          <TextInput label="Phone" type="tel" autoComplete="off" miw={160} {...form.getInputProps('phone')} />
        </Group>
        <StopSelect
          value={form.values.stopId}
          onChange={(value) => form.setFieldValue('stopId', value)}
          selected={customer?.stop ?? null}
          error={form.errors.stopId}
          clearable
          description={
            movesStop
              ? 'Moving the customer closes their time at the old stop; the history keeps both.'
              : 'Where their shears are sharpened on route.'
          }
        />
        <Textarea label="Notes" rows={3} {...form.getInputProps('notes')} />
        <Checkbox
          label="Sends visit notices by e-mail"
          description="The customer agreed to hear when the sharpener is coming to their stop."
          {...form.getInputProps('visitNoticeConsent', { type: 'checkbox' })}
        />
        {customer ? (
          <Switch
            label="Active"
            description="Inactive customers leave the lists and get no notices; their history stays."
            {...form.getInputProps('active', { type: 'checkbox' })}
          />
        ) : null}
        <Group justify="flex-end" mt="sm">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={create.isPending || update.isPending}>
            {customer ? 'Save customer' : 'Add customer'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
