import { Button, Group, Modal, Stack, Textarea } from '@mantine/core';
import { currencyDigits } from '@keenroute/shared';
import { useState } from 'react';
import { discountFieldsOf, readDiscount, type DiscountFields } from '../discount';
import type { Invoice, UpdateDraftInput } from '../types';
import { DiscountField } from './discount-field';
import type { InvoiceAction } from './invoice-action';

/** A draft's discount and note; the server prices it again. The version guards against two people editing at once. */
export function EditDraftModal({
  invoice,
  opened,
  onClose,
  run,
}: {
  invoice: Invoice;
  opened: boolean;
  onClose: () => void;
  run: InvoiceAction;
}) {
  const [discount, setDiscount] = useState<DiscountFields>(() =>
    discountFieldsOf(invoice, currencyDigits(invoice.currency)),
  );
  const [problem, setProblem] = useState<string | null>(null);
  const [notes, setNotes] = useState(invoice.notes ?? '');
  const [saving, setSaving] = useState(false);

  const submit = async (event: React.FormEvent) => {
    event.preventDefault();
    const read = readDiscount(discount, invoice.currency, invoice.linesCents);
    if ('error' in read) {
      setProblem(read.error);
      return;
    }
    setProblem(null);
    // Both kinds go, one of them zero, so switching from an amount to a share clears the amount.
    const input: UpdateDraftInput = {
      version: invoice.version,
      notes: notes.trim(),
      discountBp: read.input.discountBp ?? 0,
      discountCents: read.input.discountCents ?? 0,
    };
    setSaving(true);
    const ok = await run({ kind: 'update', input }, 'Draft saved');
    setSaving(false);
    if (ok) onClose();
  };

  return (
    <Modal opened={opened} onClose={onClose} title="Discount and note" centered>
      <form onSubmit={(event) => void submit(event)} noValidate>
        <Stack gap="md">
          <DiscountField
            value={discount}
            onChange={(next) => {
              setDiscount(next);
              setProblem(null);
            }}
            error={problem}
            currency={invoice.currency}
          />
          <Textarea
            label="Note on the invoice"
            rows={2}
            maxLength={2000}
            value={notes}
            onChange={(event) => setNotes(event.currentTarget.value)}
          />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" loading={saving}>
              Save the draft
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
