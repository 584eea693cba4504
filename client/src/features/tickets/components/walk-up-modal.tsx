import { Button, Modal, Radio, SegmentedControl, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useMediaQuery } from '@mantine/hooks';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { SheetCustomer } from '@/features/route-days/types';
import { showFieldErrors } from '@/lib/form-errors';
import { useOpenTicket, useOpenWalkUp } from '../api/open-ticket';
import type { WalkUpInput } from '../types';

function renameFields(errors: Record<string, string>): Record<string, string> {
  return Object.fromEntries(
    Object.entries(errors).map(([field, message]) => [field.replace(/^customer\./, ''), message]),
  );
}

interface WalkUpModalProps {
  opened: boolean;
  onClose: () => void;
  routeDayId: string;
  stopId: string;
  stopName: string;
  customers: SheetCustomer[];
}

/** Someone walks up with shears: pick them from the stop's customers or add them in a few words, then a ticket. */
export function WalkUpModal({ opened, onClose, routeDayId, stopId, stopName, customers }: WalkUpModalProps) {
  const narrow = useMediaQuery('(max-width: 36em)', false, { getInitialValueInEffect: false });
  const navigate = useNavigate();
  const open = useOpenTicket();
  const walkUpNew = useOpenWalkUp();
  const [who, setWho] = useState<'existing' | 'new'>(customers.length > 0 ? 'existing' : 'new');
  const [chosen, setChosen] = useState<string | null>(null);
  const [chooseError, setChooseError] = useState<string | null>(null);
  const form = useForm({
    initialValues: { name: '', phone: '', email: '' },
    validate: {
      name: (value) => (value.trim() ? null : 'Enter their name.'),
      email: (value) => (!value.trim() || /^\S+@\S+\.\S+$/.test(value.trim()) ? null : 'That e-mail looks wrong.'),
    },
  });

  const openFor = (customerId: string) =>
    open.mutate(
      { customerId, stopId, routeDayId, kind: 'walk-up' },
      { onSuccess: (ticket) => void navigate(paths.tickets.detail.getHref(ticket.id)) },
    );

  const submitNew = form.onSubmit((values) => {
    const input: WalkUpInput = { stopId, routeDayId, customer: { name: values.name.trim() } };
    if (values.phone.trim()) input.customer.phone = values.phone.trim();
    if (values.email.trim()) input.customer.email = values.email.trim();
    walkUpNew.mutate(input, {
      onSuccess: (ticket) => void navigate(paths.tickets.detail.getHref(ticket.id)),
      // The rules name the new customer's fields "customer.name"; the form's fields are flat.
      onError: (error) => showFieldErrors({ setErrors: (errors) => form.setErrors(renameFields(errors)) }, error),
    });
  });

  const busy = open.isPending || walkUpNew.isPending;
  return (
    <Modal opened={opened} onClose={onClose} title={`Walk-up at ${stopName}`} centered size="lg" fullScreen={narrow}>
      <Stack gap="md">
        {customers.length > 0 ? (
          <SegmentedControl
            aria-label="Who is it"
            fullWidth
            size="md"
            value={who}
            onChange={setWho}
            data={[
              { value: 'existing', label: 'A customer here' },
              { value: 'new', label: 'Someone new' },
            ]}
            styles={{ label: { minHeight: 44, display: 'flex', alignItems: 'center', justifyContent: 'center' } }}
          />
        ) : null}
        {who === 'existing' ? (
          <Stack gap="md">
            <Radio.Group
              label="Customer"
              value={chosen}
              onChange={(value) => {
                setChosen(value);
                setChooseError(null);
              }}
              error={chooseError}
            >
              <Stack gap={0} mt="xs">
                {customers.map((customer) => (
                  <Radio
                    key={customer.id}
                    value={customer.id}
                    label={customer.name}
                    size="md"
                    styles={{ body: { minHeight: 44, alignItems: 'center' } }}
                  />
                ))}
              </Stack>
            </Radio.Group>
            <Button
              size="lg"
              loading={busy}
              onClick={() => (chosen ? openFor(chosen) : setChooseError('Choose who it is.'))}
            >
              Open walk-up ticket
            </Button>
          </Stack>
        ) : (
          <form onSubmit={submitNew} noValidate>
            <Stack gap="md">
              <Text size="sm" c="dimmed">
                They are added as a customer of {stopName}.
              </Text>
              <TextInput label="Name" required size="lg" autoComplete="off" {...form.getInputProps('name')} />
              <TextInput label="Phone" size="lg" type="tel" autoComplete="off" {...form.getInputProps('phone')} />
              <TextInput label="E-mail" size="lg" type="email" autoComplete="off" {...form.getInputProps('email')} />
              <Button type="submit" size="lg" loading={busy}>
                Add and open ticket
              </Button>
            </Stack>
          </form>
        )}
      </Stack>
    </Modal>
  );
}
