import { Anchor, Group, Table, Text } from '@mantine/core';
import { describeShear, formatLength, EDGE_TYPE_LABELS, TOOL_KIND_LABELS } from '@keenroute/shared';
import { Link } from 'react-router-dom';
import { SortableHeader } from '@/features/customers/components/sortable-header';
import { StopLink } from '@/features/customers/components/stop-link';
import { paths } from '@/config/paths';
import { formatDay } from '@/lib/format';
import { upperFirst } from '@/lib/format';
import { makeAndModel } from '../labels';
import type { ShearSort, ShearSummary, SortOrder } from '../types';
import { LeftHandedBadge, ShearStatusBadge } from './status-badge';
import { TagCode } from './tag-code';

interface ShearTableProps {
  shears: ShearSummary[];
  /** Without sorting, the headers are plain (a customer's own few shears). */
  sorting?: { sort: ShearSort; order: SortOrder; onSort: (sort: ShearSort) => void };
  /** On a customer's page every row is theirs. */
  showOwner?: boolean;
}

function Header({
  column,
  sorting,
  children,
}: {
  column: ShearSort;
  sorting: ShearTableProps['sorting'];
  children: string;
}) {
  if (!sorting) return <Table.Th>{children}</Table.Th>;
  return (
    <SortableHeader column={column} {...sorting}>
      {children}
    </SortableHeader>
  );
}

export function ShearTable({ shears, sorting, showOwner = true }: ShearTableProps) {
  return (
    <Table.ScrollContainer minWidth={showOwner ? 960 : 720}>
      <Table verticalSpacing="sm" highlightOnHover striped="even" stripedColor="gray.0">
        <Table.Thead>
          <Table.Tr>
            <Header column="tagCode" sorting={sorting}>
              Tag code
            </Header>
            <Header column="make" sorting={sorting}>
              Make and model
            </Header>
            <Header column="lengthIn" sorting={sorting}>
              Length
            </Header>
            <Header column="edgeType" sorting={sorting}>
              Edge type
            </Header>
            <Table.Th>Tool kind</Table.Th>
            {showOwner ? (
              <>
                <Header column="customer" sorting={sorting}>
                  Customer
                </Header>
                <Table.Th>Stop</Table.Th>
              </>
            ) : null}
            <Table.Th>Status</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {shears.map((shear) => (
            <Table.Tr key={shear.id}>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>
                <Anchor
                  component={Link}
                  to={paths.shears.detail.getHref(shear.id)}
                  aria-label={`Open ${shear.tagCode}`}
                >
                  <TagCode code={shear.tagCode} />
                </Anchor>
              </Table.Td>
              <Table.Td>{makeAndModel(shear)}</Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>{formatLength(shear.lengthIn)}</Table.Td>
              <Table.Td>{upperFirst(EDGE_TYPE_LABELS[shear.edgeType])}</Table.Td>
              <Table.Td>
                <Group gap={6} wrap="nowrap">
                  <Text span size="sm">
                    {upperFirst(TOOL_KIND_LABELS[shear.toolKind])}
                  </Text>
                  {shear.handedness === 'left' ? <LeftHandedBadge /> : null}
                </Group>
              </Table.Td>
              {showOwner ? (
                <>
                  <Table.Td>
                    <Anchor component={Link} to={paths.customers.detail.getHref(shear.customer.id)} size="sm">
                      {shear.customer.name}
                    </Anchor>
                  </Table.Td>
                  <Table.Td>
                    <StopLink stop={shear.stop} />
                  </Table.Td>
                </>
              ) : null}
              <Table.Td>
                <ShearStatusBadge status={shear.status} />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

/** The phone's view: one card per shear, the whole card a link to its page. */
export function ShearCards({ shears, showOwner = true }: { shears: ShearSummary[]; showOwner?: boolean }) {
  return (
    <ul style={{ listStyle: 'none', padding: 0, margin: 0, display: 'grid', gap: 'var(--mantine-spacing-sm)' }}>
      {shears.map((shear) => (
        <li key={shear.id}>
          <Anchor
            component={Link}
            to={paths.shears.detail.getHref(shear.id)}
            underline="never"
            c="inherit"
            display="block"
            p="md"
            style={{ border: '1px solid var(--mantine-color-gray-3)', borderRadius: 'var(--mantine-radius-md)' }}
          >
            <Group justify="space-between" gap="xs" wrap="nowrap" align="flex-start">
              <TagCode code={shear.tagCode} size="lg" />
              <ShearStatusBadge status={shear.status} />
            </Group>
            <Text size="sm" fw={600} mt={4}>
              {makeAndModel(shear)}
            </Text>
            <Text size="sm">{upperFirst(describeShear(shear))}</Text>
            {showOwner ? (
              <Text size="sm" c="dimmed" style={{ overflowWrap: 'anywhere' }}>
                {shear.customer.name}
                {shear.stop ? ` · ${shear.stop.name}` : ''}
              </Text>
            ) : null}
            <Text size="xs" c="dimmed" mt={4}>
              {shear.lastServicedOn ? `Last serviced ${formatDay(shear.lastServicedOn)}` : 'Not serviced yet'}
            </Text>
          </Anchor>
        </li>
      ))}
    </ul>
  );
}
