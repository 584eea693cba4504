import { Anchor, Badge, Button, Card, Group, Select, Stack, Text, TextInput } from '@mantine/core';
import { IconTicket } from '@tabler/icons-react';
import { Link, useSearchParams } from 'react-router-dom';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { todayIso } from '@/features/stops/format';
import { formatDay } from '@/lib/format';
import { useSignedInUser } from '@/lib/session';
import { useTickets } from '../api/get-tickets';
import { money, TICKET_KIND_LABELS, TICKET_STATUS_COLORS, TICKET_STATUS_LABELS } from '../labels';
import { TICKET_STATUSES, type TicketListParams, type TicketStatus, type TicketSummary } from '../types';

const STATUS_OPTIONS = TICKET_STATUSES.map((value) => ({ value, label: TICKET_STATUS_LABELS[value] }));
const isStatus = (value: string | null): value is TicketStatus =>
  value !== null && (TICKET_STATUSES as readonly string[]).includes(value);

function TicketRow({ ticket }: { ticket: TicketSummary }) {
  return (
    <Card component="li" withBorder radius="lg" padding="md">
      <Group justify="space-between" gap="sm" wrap="nowrap" align="flex-start">
        <Stack gap={2} style={{ minWidth: 0 }}>
          <Anchor component={Link} to={paths.tickets.detail.getHref(ticket.id)} fw={700} size="xl" mih={44}>
            {ticket.customer.name}
          </Anchor>
          <Text c="dimmed">
            {[ticket.stop?.name, TICKET_KIND_LABELS[ticket.kind], ticket.visitDay ? formatDay(ticket.visitDay) : null]
              .filter(Boolean)
              .join(' · ')}
          </Text>
          <Text size="sm">
            {ticket.lineCount} {ticket.lineCount === 1 ? 'pair' : 'pairs'}
          </Text>
        </Stack>
        <Stack gap={4} align="flex-end">
          <Badge size="lg" radius="sm" color={TICKET_STATUS_COLORS[ticket.status]}>
            {TICKET_STATUS_LABELS[ticket.status]}
          </Badge>
          <Text fw={600}>{money(ticket.totalCents)}</Text>
        </Stack>
      </Group>
    </Card>
  );
}

/** Tickets by day and status; a sharpener sees the tickets of their own route days (the server decides). */
export function TicketsRoute() {
  const { role } = useSignedInUser();
  const [search, setSearch] = useSearchParams();
  const day = search.get('day') ?? '';
  const status = search.get('status');
  const params: TicketListParams = {};
  if (day) params.day = day;
  if (isStatus(status)) params.status = status;
  const tickets = useTickets(params);

  const setFilter = (name: 'day' | 'status', value: string | null) => {
    const next = new URLSearchParams(search);
    if (value) next.set(name, value);
    else next.delete(name);
    setSearch(next, { replace: true });
  };

  return (
    <Stack gap="md" maw={720}>
      <PageHeader
        title="Tickets"
        description={
          role === 'sharpener' ? 'The tickets of your route days.' : 'Every ticket: visits, walk-ups and drop-offs.'
        }
      />
      <Group gap="sm" align="flex-end" wrap="wrap">
        <TextInput
          type="date"
          label="Day"
          size="lg"
          value={day}
          onChange={(event) => setFilter('day', event.currentTarget.value || null)}
          style={{ flex: '1 1 10rem' }}
        />
        <Select
          label="Status"
          size="lg"
          placeholder="Any status"
          clearable
          data={STATUS_OPTIONS}
          value={isStatus(status) ? status : null}
          onChange={(value) => setFilter('status', value)}
          comboboxProps={{ withinPortal: true }}
          style={{ flex: '1 1 10rem' }}
        />
        <Button variant="default" size="lg" onClick={() => setFilter('day', todayIso())}>
          Today
        </Button>
      </Group>
      {tickets.isPending ? <ListLoading label="Loading the tickets" /> : null}
      {tickets.isError ? (
        <ListLoadFailed
          title="The tickets could not be loaded"
          message={tickets.error.message}
          onRetry={() => void tickets.refetch()}
        />
      ) : null}
      {tickets.data && tickets.data.items.length === 0 ? (
        <ListEmpty icon={<IconTicket size={36} stroke={1.4} aria-hidden="true" />} title="No tickets">
          <Text size="sm" c="dimmed">
            Tickets are opened at a stop, from the day sheet.
          </Text>
        </ListEmpty>
      ) : null}
      {tickets.data && tickets.data.items.length > 0 ? (
        <Stack component="ul" gap="sm" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Tickets">
          {tickets.data.items.map((ticket) => (
            <TicketRow key={ticket.id} ticket={ticket} />
          ))}
        </Stack>
      ) : null}
    </Stack>
  );
}
