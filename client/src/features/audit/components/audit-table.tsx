import { Anchor, Badge, Table, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { AUDIT_ACTION_COLORS, AUDIT_ACTION_LABELS, describeEntry } from '../labels';
import type { AuditEntry } from '../types';

const dash = (
  <Text span c="dimmed">
    —
  </Text>
);

/** Who did it: the e-mail as it was then; the payment service has none. */
function Actor({ entry }: { entry: AuditEntry }) {
  if (entry.actorEmail) return <>{entry.actorEmail}</>;
  return entry.action === 'payment-recorded' ? (
    <Text span c="dimmed">
      Payment service
    </Text>
  ) : (
    dash
  );
}

/** Where the change can be seen: the ticket, the invoice, or the team page for a person. */
function Subject({ entry }: { entry: AuditEntry }) {
  if (!entry.subjectId) return dash;
  if (entry.subjectType === 'ticket') {
    return (
      <Anchor component={Link} to={paths.tickets.detail.getHref(entry.subjectId)}>
        Ticket
      </Anchor>
    );
  }
  if (entry.subjectType === 'invoice') {
    const number = entry.detail.invoiceNumber ?? entry.detail.number;
    return (
      <Anchor component={Link} to={paths.invoices.detail.getHref(entry.subjectId)} style={{ whiteSpace: 'nowrap' }}>
        {typeof number === 'string' ? number : 'Invoice'}
      </Anchor>
    );
  }
  return (
    <Anchor component={Link} to={paths.team.getHref()}>
      Team
    </Anchor>
  );
}

// A table only: the owner reads the log at a desk, and the scroll container keeps it usable on a phone.
export function AuditTable({ entries }: { entries: AuditEntry[] }) {
  return (
    <Table.ScrollContainer minWidth={960}>
      <Table verticalSpacing="sm" highlightOnHover striped="even" stripedColor="gray.0" aria-label="Audit log">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>When</Table.Th>
            <Table.Th>Who</Table.Th>
            <Table.Th>Kind</Table.Th>
            <Table.Th>What</Table.Th>
            <Table.Th>On</Table.Th>
            <Table.Th>Address</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {entries.map((entry) => (
            <Table.Tr key={entry.id}>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>{formatDateTime(entry.at)}</Table.Td>
              <Table.Td>
                <Actor entry={entry} />
              </Table.Td>
              <Table.Td>
                <Badge variant="light" color={AUDIT_ACTION_COLORS[entry.action]} style={{ whiteSpace: 'nowrap' }}>
                  {AUDIT_ACTION_LABELS[entry.action]}
                </Badge>
              </Table.Td>
              <Table.Td miw={260}>{describeEntry(entry)}</Table.Td>
              <Table.Td>
                <Subject entry={entry} />
              </Table.Td>
              <Table.Td>
                {entry.ip ? (
                  <Text span size="sm" ff="monospace">
                    {entry.ip}
                  </Text>
                ) : (
                  dash
                )}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
