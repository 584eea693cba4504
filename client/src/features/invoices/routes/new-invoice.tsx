import { Anchor, Group, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconArrowLeft, IconTicket } from '@tabler/icons-react';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useCreateInvoice } from '../api/create-invoice';
import { useReadyGroups } from '../api/get-ready';
import { ReadyGroupCard, readyGroupKey } from '../components/ready-group-card';

/** Finished tickets left for an invoice, one card per payer; each card makes one draft. */
export function NewInvoiceRoute() {
  const navigate = useNavigate();
  const ready = useReadyGroups();
  const create = useCreateInvoice();
  const groups = ready.data ?? [];
  // Which card's draft is being made, so only its button spins.
  const [creatingKey, setCreatingKey] = useState<string | null>(null);

  return (
    <Stack gap="md" maw={1200}>
      <Anchor component={Link} to={paths.invoices.list.getHref()} size="sm" w="fit-content">
        <Group gap={4} mih={44}>
          <IconArrowLeft size={18} aria-hidden="true" />
          Invoices
        </Group>
      </Anchor>
      <PageHeader
        title="New invoice"
        description="Tickets left for an invoice, grouped by who pays: the stop, where it pays for its visits, or the customer."
      />
      {ready.isPending ? (
        <ListLoading label="Loading the tickets to invoice" />
      ) : ready.isError ? (
        <ListLoadFailed
          title="The tickets to invoice could not be loaded"
          message={ready.error.message}
          onRetry={() => void ready.refetch()}
        />
      ) : groups.length === 0 ? (
        <ListEmpty
          icon={<IconTicket size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
          title="No tickets are waiting for an invoice."
        >
          <Text size="sm" c="dimmed" maw={460}>
            A ticket shows here once it is finished and left for an invoice when the shears are handed back.
          </Text>
        </ListEmpty>
      ) : (
        <SimpleGrid cols={{ base: 1, md: 2 }} spacing="md">
          {groups.map((group) => {
            const key = readyGroupKey(group);
            return (
              <ReadyGroupCard
                key={key}
                group={group}
                creating={create.isPending && creatingKey === key}
                onCreate={(input) => {
                  setCreatingKey(key);
                  create.mutate(input, {
                    onSuccess: (invoice) => void navigate(paths.invoices.detail.getHref(invoice.id)),
                  });
                }}
              />
            );
          })}
        </SimpleGrid>
      )}
    </Stack>
  );
}
