import { Button, Stack, Text } from '@mantine/core';
import { useDisclosure, useMediaQuery } from '@mantine/hooks';
import { IconBuildingBank, IconFileInvoice, IconFileSpreadsheet, IconPlus } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { ListFooter } from '@/features/customers/components/list-footer';
import { useInvoices } from '../api/get-invoices';
import { ExportModal } from '../components/export-modal';
import { InvoiceFilters } from '../components/invoice-filters';
import { InvoiceCards, InvoiceTable } from '../components/invoice-list';
import { SendRemindersButton } from '../components/send-reminders-button';
import { INVOICE_PAGE_SIZE, toInvoiceQuery, useInvoiceSearch } from '../hooks/use-invoice-search';

/** Every invoice, newest first: drafts to issue, what is owed and overdue, what is paid or void. */
export function InvoicesRoute() {
  const { params, update } = useInvoiceSearch();
  const list = useInvoices(toInvoiceQuery(params));
  const showCards = useMediaQuery('(max-width: 48em)', false, { getInitialValueInEffect: false });
  const [exportOpened, exportModal] = useDisclosure(false);
  const invoices = list.data?.items ?? [];
  const filtered = Boolean(params.q) || params.status !== 'all';

  return (
    <Stack gap="md" maw={1200}>
      <PageHeader
        title="Invoices"
        description="Bills for finished tickets, to a customer or to the stop: issue, send, record payments."
        actions={
          <>
            <Button component={Link} to={paths.invoices.create.getHref()} leftSection={<IconPlus size={18} />}>
              New invoice
            </Button>
            <Button variant="default" leftSection={<IconFileSpreadsheet size={18} />} onClick={exportModal.open}>
              Export CSV
            </Button>
            <SendRemindersButton />
            <Button
              component={Link}
              to={paths.businessProfile.getHref()}
              variant="subtle"
              leftSection={<IconBuildingBank size={18} />}
            >
              Business profile
            </Button>
          </>
        }
      />

      <InvoiceFilters params={params} update={update} />

      {list.isPending ? (
        <ListLoading label="Loading the invoices" />
      ) : list.isError ? (
        <ListLoadFailed
          title="The invoices could not be loaded"
          message={list.error.message}
          onRetry={() => void list.refetch()}
        />
      ) : invoices.length === 0 ? (
        <ListEmpty
          icon={<IconFileInvoice size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
          title={filtered ? 'No invoice matches these filters.' : 'No invoices yet.'}
        >
          {filtered ? (
            <Button variant="subtle" onClick={() => update({ q: '', status: 'all', page: 1 })}>
              Show all invoices
            </Button>
          ) : (
            <Text size="sm" c="dimmed" maw={420}>
              Tickets left for an invoice wait under New invoice, grouped by who pays.
            </Text>
          )}
        </ListEmpty>
      ) : showCards ? (
        <InvoiceCards invoices={invoices} />
      ) : (
        <InvoiceTable invoices={invoices} />
      )}

      <ListFooter
        page={params.page}
        pageSize={list.data?.pageSize ?? INVOICE_PAGE_SIZE}
        total={list.data?.total ?? 0}
        loadingNext={list.isPlaceholderData}
        onPage={(page) => update({ page })}
      />

      <ExportModal opened={exportOpened} onClose={exportModal.close} />
    </Stack>
  );
}
