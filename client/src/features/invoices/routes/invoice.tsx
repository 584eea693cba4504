import { Anchor, Grid, Group, Stack } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link, useParams } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { RecordLoadFailed } from '@/features/customers/components/record-states';
import { useSignedInUser } from '@/lib/session';
import { canManageInvoices } from '../access';
import { useChangeInvoice } from '../api/change-invoice';
import { useInvoice } from '../api/get-invoice';
import { InvoiceActions } from '../components/invoice-actions';
import type { InvoiceAction } from '../components/invoice-action';
import { InvoiceHeader } from '../components/invoice-header';
import { InvoiceLedger, InvoiceTickets } from '../components/invoice-ledger';
import { InvoiceLines } from '../components/invoice-lines';
import { SendLog } from '../components/send-log';
import { invoiceTitle } from '../labels';

/** One invoice: what it bills, what is owed, and what the person's role lets them do with it. */
export function InvoiceRoute() {
  const { invoiceId = '' } = useParams();
  const { role } = useSignedInUser();
  const invoice = useInvoice(invoiceId);
  const change = useChangeInvoice(invoiceId);
  const manage = canManageInvoices(role);
  const narrow = useMediaQuery('(max-width: 62em)', false, { getInitialValueInEffect: false });
  const back = manage
    ? { to: paths.invoices.list.getHref(), label: 'Invoices' }
    : role === 'client'
      ? { to: paths.invoices.mine.getHref(), label: 'My invoices' }
      : { to: paths.home.getHref(), label: 'Home' };

  const run: InvoiceAction = async (next, done) => {
    try {
      const updated = await change.mutateAsync(next);
      notifications.show({ color: 'keenTeal', title: done, message: invoiceTitle(updated) });
      return true;
    } catch {
      // The notification with the server's words has been shown already.
      return false;
    }
  };

  if (invoice.isPending) return <PageLoader label="Loading the invoice" />;
  if (invoice.isError) {
    return (
      <RecordLoadFailed
        what="invoice"
        error={invoice.error}
        onRetry={() => void invoice.refetch()}
        back={{ to: back.to, label: `Back to ${back.label}` }}
      />
    );
  }

  const record = invoice.data;
  const actions = <InvoiceActions invoice={record} role={role} run={run} />;
  const sendLog = manage ? <SendLog invoiceId={record.id} /> : null;
  return (
    <Stack gap="md" maw={1200}>
      <Anchor component={Link} to={back.to} size="sm" w="fit-content">
        <Group gap={4} mih={44}>
          <IconArrowLeft size={18} aria-hidden="true" />
          {back.label}
        </Group>
      </Anchor>
      <InvoiceHeader invoice={record} />
      {narrow ? (
        // The phone: what can be done first, right under the balance.
        <>
          {actions}
          <InvoiceLines invoice={record} />
          <InvoiceLedger invoice={record} />
          <InvoiceTickets invoice={record} linkTickets={role !== 'client'} />
          {sendLog}
        </>
      ) : (
        <Grid gap="md">
          <Grid.Col span={7}>
            <Stack gap="md">
              <InvoiceLines invoice={record} />
              <InvoiceTickets invoice={record} linkTickets={role !== 'client'} />
            </Stack>
          </Grid.Col>
          <Grid.Col span={5}>
            <Stack gap="md">
              {actions}
              <InvoiceLedger invoice={record} />
              {sendLog}
            </Stack>
          </Grid.Col>
        </Grid>
      )}
    </Stack>
  );
}
