import { Anchor, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconFileInvoice } from '@tabler/icons-react';
import { Link, useSearchParams } from 'react-router-dom';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { ListFooter } from '@/features/customers/components/list-footer';
import { positiveInt } from '@/features/customers/hooks/use-list-search';
import { useMyInvoices } from '../api/get-my-invoices';
import { InvoiceDrawer } from '../components/invoice-drawer';
import { MyInvoiceCard } from '../components/my-invoice-card';

const PAGE_SIZE = 12;

/** A client's invoices (or their shop's): the server sends theirs only, newest first. */
export function MyInvoicesRoute() {
  const [searchParams, setSearchParams] = useSearchParams();
  const page = positiveInt(searchParams.get('page'), 1);
  const openId = searchParams.get('invoice');
  const list = useMyInvoices(page, PAGE_SIZE);
  const invoices = list.data?.items ?? [];
  const openNumber = invoices.find((invoice) => invoice.id === openId)?.number;

  // The open invoice lives in the address, so the phone's back button closes the drawer.
  const show = (id: string | null) =>
    setSearchParams(
      (current) => {
        const next = new URLSearchParams(current);
        if (id) next.set('invoice', id);
        else next.delete('invoice');
        return next;
      },
      { replace: id === null },
    );

  return (
    <Stack gap="md" maw={1200}>
      <PageHeader
        title="My invoices"
        description="Your invoices for sharpening: what is owed, the PDF, the payments received, and paying online."
      />
      {list.isPending ? (
        <ListLoading label="Loading your invoices" />
      ) : list.isError ? (
        <ListLoadFailed
          title="Your invoices could not be loaded"
          message={list.error.message}
          onRetry={() => void list.refetch()}
        />
      ) : invoices.length === 0 ? (
        <ListEmpty
          icon={<IconFileInvoice size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
          title="No invoices yet"
        >
          <Text size="sm" c="dimmed" maw={460}>
            When your sharpening is billed on an invoice rather than paid at the stop, the invoice appears here once it
            is sent, with a button to pay it online.
          </Text>
          {page > 1 ? (
            <Anchor component={Link} to={paths.invoices.mine.getHref()}>
              Go to the first page
            </Anchor>
          ) : null}
        </ListEmpty>
      ) : (
        <SimpleGrid
          cols={{ base: 1, sm: 2, lg: 3 }}
          spacing="md"
          component="ul"
          p={0}
          m={0}
          style={{ listStyle: 'none' }}
        >
          {invoices.map((invoice) => (
            <li key={invoice.id}>
              <MyInvoiceCard invoice={invoice} onOpen={() => show(invoice.id)} />
            </li>
          ))}
        </SimpleGrid>
      )}
      <ListFooter
        page={page}
        pageSize={PAGE_SIZE}
        total={list.data?.total ?? 0}
        loadingNext={list.isPlaceholderData}
        onPage={(next) => setSearchParams(next === 1 ? {} : { page: String(next) })}
      />
      <InvoiceDrawer id={openId} title={openNumber ?? 'Invoice'} onClose={() => show(null)} />
    </Stack>
  );
}
