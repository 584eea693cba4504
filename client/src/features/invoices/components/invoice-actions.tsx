import { Button, Card, CopyButton, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import type { Role } from '@keenroute/shared';
import {
  IconBan,
  IconCash,
  IconCheck,
  IconCopy,
  IconCreditCard,
  IconDownload,
  IconPencil,
  IconReceiptRefund,
  IconSend,
  IconTrash,
} from '@tabler/icons-react';
import { useState } from 'react';
import { canManageInvoices, canRecordPayment } from '../access';
import { useDownloadInvoicePdf } from '../api/download-invoice-pdf';
import type { Invoice } from '../types';
import { CreditNoteModal } from './credit-note-modal';
import { DeleteDraftModal } from './delete-draft-modal';
import { EditDraftModal } from './edit-draft-modal';
import type { InvoiceAction } from './invoice-action';
import { PaymentModal } from './payment-modal';
import { SendModal } from './send-modal';
import { VoidModal } from './void-modal';

const ISSUED = ['sent', 'part-paid', 'paid'];

interface InvoiceActionsProps {
  invoice: Invoice;
  role: Role;
  run: InvoiceAction;
}

/** What this person may do with the invoice now, by role and status; the server decides in the end. */
export function InvoiceActions({ invoice, role, run }: InvoiceActionsProps) {
  const manage = canManageInvoices(role);
  const issued = ISSUED.includes(invoice.status);
  const owed = issued && invoice.balanceCents > 0;
  const creditable = issued && invoice.totalCents - invoice.creditedCents > 0;
  const pdf = useDownloadInvoicePdf();
  const [issuing, setIssuing] = useState(false);
  const [sendOpened, send] = useDisclosure(false);
  const [payOpened, pay] = useDisclosure(false);
  const [creditOpened, credit] = useDisclosure(false);
  const [voidOpened, voidModal] = useDisclosure(false);
  const [editOpened, edit] = useDisclosure(false);
  const [deleteOpened, remove] = useDisclosure(false);

  const issue = async () => {
    setIssuing(true);
    await run({ kind: 'issue' }, 'Invoice issued');
    setIssuing(false);
  };

  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="invoice-actions-title">
      <Stack gap="sm">
        <Title order={2} fz="h3" id="invoice-actions-title">
          Actions
        </Title>
        <SimpleGrid cols={{ base: 1, xs: 2, md: 1 }} spacing="sm">
          {manage && invoice.status === 'draft' ? (
            <Button leftSection={<IconCheck size={18} />} loading={issuing} onClick={() => void issue()}>
              Issue
            </Button>
          ) : null}
          {manage && invoice.status !== 'void' ? (
            <Button
              variant={invoice.status === 'draft' ? 'light' : 'filled'}
              leftSection={<IconSend size={18} />}
              onClick={send.open}
            >
              {invoice.sentAt ? 'Resend by e-mail' : 'Send by e-mail'}
            </Button>
          ) : null}
          {canRecordPayment(role) && owed ? (
            <Button variant="light" leftSection={<IconCash size={18} />} onClick={pay.open}>
              Record payment
            </Button>
          ) : null}
          {role === 'client' && invoice.payUrl ? (
            <Button component="a" href={invoice.payUrl} leftSection={<IconCreditCard size={18} />}>
              Pay online
            </Button>
          ) : null}
          <Button
            variant="default"
            leftSection={<IconDownload size={18} />}
            loading={pdf.isPending}
            onClick={() => pdf.mutate(invoice)}
          >
            {invoice.status === 'draft' ? 'Download draft PDF' : 'Download PDF'}
          </Button>
          {manage && invoice.payUrl ? (
            <CopyButton value={invoice.payUrl}>
              {({ copied, copy }) => (
                <Button
                  variant="default"
                  leftSection={copied ? <IconCheck size={18} /> : <IconCopy size={18} />}
                  color={copied ? 'keenTeal' : undefined}
                  onClick={copy}
                >
                  {copied ? 'Pay link copied' : 'Copy pay link'}
                </Button>
              )}
            </CopyButton>
          ) : null}
          {manage && invoice.status === 'draft' ? (
            <Button variant="default" leftSection={<IconPencil size={18} />} onClick={edit.open}>
              Discount and note
            </Button>
          ) : null}
          {manage && creditable ? (
            <Button variant="default" leftSection={<IconReceiptRefund size={18} />} onClick={credit.open}>
              Credit note
            </Button>
          ) : null}
          {manage && issued ? (
            <Button variant="subtle" color="red" leftSection={<IconBan size={18} />} onClick={voidModal.open}>
              Void
            </Button>
          ) : null}
          {manage && invoice.status === 'draft' ? (
            <Button variant="subtle" color="red" leftSection={<IconTrash size={18} />} onClick={remove.open}>
              Delete draft
            </Button>
          ) : null}
        </SimpleGrid>
        {invoice.status === 'void' ? (
          <Text size="sm" c="dimmed">
            Nothing more can be done with a void invoice; its PDF says VOID.
          </Text>
        ) : null}
      </Stack>

      {/* Mounted while open only, so each opening starts from the invoice as it is now. */}
      {sendOpened ? <SendModal invoice={invoice} opened onClose={send.close} run={run} /> : null}
      {payOpened ? <PaymentModal invoice={invoice} opened onClose={pay.close} run={run} /> : null}
      {creditOpened ? <CreditNoteModal invoice={invoice} opened onClose={credit.close} run={run} /> : null}
      {voidOpened ? <VoidModal invoice={invoice} opened onClose={voidModal.close} run={run} /> : null}
      {editOpened ? <EditDraftModal invoice={invoice} opened onClose={edit.close} run={run} /> : null}
      {deleteOpened ? <DeleteDraftModal invoiceId={invoice.id} opened onClose={remove.close} /> : null}
    </Card>
  );
}
