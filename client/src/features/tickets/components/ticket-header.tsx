import { Anchor, Badge, Group, Stack, Text, Title } from '@mantine/core';
import { IconPhone } from '@tabler/icons-react';
import { TICKET_KIND_LABELS, TICKET_STATUS_COLORS, TICKET_STATUS_LABELS } from '../labels';
import type { Ticket } from '../types';

function telHref(phone: string): string {
  return `tel:${phone.replace(/[^\d+]/g, '')}`;
}

/** Whose shears these are, where, and how far the ticket has come. */
export function TicketHeader({ ticket }: { ticket: Ticket }) {
  return (
    <Stack gap={4}>
      <Group gap="xs">
        <Badge size="lg" radius="sm" color={TICKET_STATUS_COLORS[ticket.status]}>
          {TICKET_STATUS_LABELS[ticket.status]}
        </Badge>
        <Badge size="lg" radius="sm" variant="light" color="gray">
          {TICKET_KIND_LABELS[ticket.kind]}
        </Badge>
      </Group>
      <Title order={1} fz={{ base: 'h2', sm: 'h1' }}>
        {ticket.customer.name}
      </Title>
      {ticket.stop ? <Text size="lg">{ticket.stop.name}</Text> : null}
      {ticket.customer.phone ? (
        <Anchor
          href={telHref(ticket.customer.phone)}
          aria-label={`Call ${ticket.customer.name}: ${ticket.customer.phone}`}
          style={{ display: 'inline-flex', alignItems: 'center', gap: 8, minHeight: 44 }}
        >
          <IconPhone size={20} aria-hidden="true" />
          {ticket.customer.phone}
        </Anchor>
      ) : null}
      {ticket.notes ? <Text c="dimmed">{ticket.notes}</Text> : null}
    </Stack>
  );
}
