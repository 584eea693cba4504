import { Button, Group, Modal, Stack, Text, TextInput, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { isRuleError, parseMoney } from '@keenroute/shared';
import { useState } from 'react';
import { money } from '../labels';
import type { TicketLine } from '../types';
import { useTicketScreen } from './ticket-context';

function centsOrError(text: string, currency: string): number | string {
  try {
    return parseMoney(text, currency, 'The price');
  } catch (error) {
    if (isRuleError(error)) return error.message;
    throw error;
  }
}

/** Owner or office set a line's price by hand; the reason is required and the server keeps an audit row. */
export function OverrideModal({ line, opened, onClose }: { line: TicketLine; opened: boolean; onClose: () => void }) {
  const { saver, currency } = useTicketScreen();
  const [saving, setSaving] = useState(false);
  const form = useForm({
    initialValues: { amount: (line.effectiveCents / 100).toFixed(2), reason: line.overrideReason ?? '' },
    validate: {
      amount: (value) => {
        const cents = centsOrError(value, currency);
        return typeof cents === 'string' ? cents : null;
      },
      reason: (value) => (value.trim().length >= 3 ? null : 'Say why the price changes, for the record.'),
    },
  });

  const submit = form.onSubmit(async (values) => {
    setSaving(true);
    const outcome = await saver.save({
      kind: 'override',
      lineId: line.id,
      cents: Number(centsOrError(values.amount, currency)),
      reason: values.reason.trim(),
    });
    setSaving(false);
    if (outcome.ok) onClose();
  });

  return (
    <Modal opened={opened} onClose={onClose} title={`Change the price of ${line.shear.tagCode}`} centered>
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text size="sm" c="dimmed">
            The rates give {money(line.priceCents, currency)}.
          </Text>
          <TextInput label="New price" inputMode="decimal" size="lg" required {...form.getInputProps('amount')} />
          <Textarea label="Reason" required rows={2} size="md" {...form.getInputProps('reason')} />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" size="lg" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" size="lg" loading={saving}>
              Save price
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
