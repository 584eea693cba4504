import { Badge, Button, Card, Checkbox, Group, Stack, Text, Textarea, Title } from '@mantine/core';
import { IconFileInvoice } from '@tabler/icons-react';
import { useId, useState } from 'react';
import { formatDay } from '@/lib/format';
import { readDiscount, type DiscountFields } from '../discount';
import { money } from '../labels';
import type { CreateInvoiceInput, ReadyGroup, ReadyTicket } from '../types';
import { DiscountField } from './discount-field';

export function readyGroupKey(group: ReadyGroup): string {
  return [group.billTo, group.customerId ?? group.stopId ?? group.name, group.currency].join(':');
}

function ticketWords(ticket: ReadyTicket): string {
  return [formatDay(ticket.visitDay), ticket.stopName, ticket.customerName].filter(Boolean).join(' · ');
}

interface ReadyGroupCardProps {
  group: ReadyGroup;
  creating: boolean;
  onCreate: (input: CreateInvoiceInput) => void;
}

/** One payer's tickets left for an invoice: all chosen at first; an optional discount and note; then a draft. */
export function ReadyGroupCard({ group, creating, onCreate }: ReadyGroupCardProps) {
  const titleId = useId();
  const [chosen, setChosen] = useState<string[]>(() => group.tickets.map((ticket) => ticket.id));
  const [extrasOpen, setExtrasOpen] = useState(false);
  const [discount, setDiscount] = useState<DiscountFields>({ mode: 'none', value: '' });
  const [discountError, setDiscountError] = useState<string | null>(null);
  const [notes, setNotes] = useState('');

  const picked = group.tickets.filter((ticket) => chosen.includes(ticket.id));
  const totalCents = picked.reduce((sum, ticket) => sum + ticket.totalCents, 0);
  const paidCents = picked.reduce((sum, ticket) => sum + ticket.paidCents, 0);

  const create = () => {
    const read = readDiscount(discount, group.currency);
    if ('error' in read) {
      setExtrasOpen(true);
      setDiscountError(read.error);
      return;
    }
    setDiscountError(null);
    const input: CreateInvoiceInput = { ticketIds: chosen, ...read.input };
    if (notes.trim()) input.notes = notes.trim();
    onCreate(input);
  };

  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby={titleId}>
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" gap="xs">
          <Stack gap={2} style={{ minWidth: 0, flex: '1 1 12rem' }}>
            <Title order={2} fz="h3" id={titleId} style={{ overflowWrap: 'anywhere' }}>
              {group.name}
            </Title>
            <Text size="sm" c="dimmed" style={{ overflowWrap: 'anywhere' }}>
              {group.email ?? 'No e-mail on file: the invoice can be downloaded, not e-mailed.'}
            </Text>
          </Stack>
          <Badge variant="light" color={group.billTo === 'stop' ? 'brass' : 'keenTeal'} radius="sm">
            {group.billTo === 'stop' ? 'The stop pays' : 'The customer pays'}
          </Badge>
        </Group>

        <Checkbox.Group value={chosen} onChange={setChosen} label="Tickets on this invoice">
          <Stack gap="xs" mt="xs">
            {group.tickets.map((ticket) => (
              <Checkbox
                key={ticket.id}
                value={ticket.id}
                size="md"
                label={
                  <Group gap="xs" justify="space-between" wrap="nowrap">
                    <Text span size="sm" style={{ overflowWrap: 'anywhere' }}>
                      {ticketWords(ticket)}
                    </Text>
                    <Text span size="sm" fw={600} style={{ whiteSpace: 'nowrap' }}>
                      {money(ticket.totalCents, group.currency)}
                    </Text>
                  </Group>
                }
                description={
                  ticket.paidCents > 0 ? `${money(ticket.paidCents, group.currency)} paid on site` : undefined
                }
                styles={{ labelWrapper: { flex: 1 }, body: { minHeight: 32 } }}
              />
            ))}
          </Stack>
        </Checkbox.Group>

        <Group justify="space-between" gap="xs">
          <Text size="sm" c="dimmed">
            {picked.length} of {group.tickets.length} tickets
            {paidCents > 0 ? ` · ${money(paidCents, group.currency)} already paid` : ''}
          </Text>
          <Text fw={700} aria-label="Chosen tickets total">
            {money(totalCents, group.currency)}
          </Text>
        </Group>

        <Button variant="subtle" size="sm" onClick={() => setExtrasOpen((open) => !open)} w="fit-content" px={0}>
          {extrasOpen ? 'Hide the discount and note' : 'Add a discount or a note'}
        </Button>
        {extrasOpen ? (
          <Stack gap="sm">
            <DiscountField
              value={discount}
              onChange={(next) => {
                setDiscount(next);
                setDiscountError(null);
              }}
              error={discountError}
              currency={group.currency}
            />
            <Textarea
              label="Note on the invoice"
              rows={2}
              maxLength={2000}
              value={notes}
              onChange={(event) => setNotes(event.currentTarget.value)}
            />
          </Stack>
        ) : null}

        <Button
          leftSection={<IconFileInvoice size={18} aria-hidden="true" />}
          disabled={chosen.length === 0}
          loading={creating}
          onClick={create}
        >
          Make the draft invoice
        </Button>
        {chosen.length === 0 ? (
          <Text size="sm" c="dimmed">
            Choose at least one ticket.
          </Text>
        ) : null}
      </Stack>
    </Card>
  );
}
