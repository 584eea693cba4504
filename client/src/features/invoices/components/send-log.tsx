import { Alert, Badge, Card, Group, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import { formatDateTime } from '@/lib/format';
import { useInvoiceMails } from '../api/get-invoice-mails';
import { invoiceKeys } from '../api/keys';
import { MAIL_KIND_LABELS } from '../labels';
import type { InvoiceMail } from '../types';

const STATUS_BADGES: Record<InvoiceMail['status'], { label: string; color: string }> = {
  queued: { label: 'Queued', color: 'gray' },
  sent: { label: 'Sent', color: 'keenTeal' },
  failed: { label: 'Failed', color: 'red' },
};

/** Every e-mail about this invoice (the invoice, reminders, receipts) and whether it went. */
export function SendLog({ invoiceId }: { invoiceId: string }) {
  const mails = useInvoiceMails(invoiceId);
  const queryClient = useQueryClient();
  const queued = mails.data?.filter((mail) => mail.status === 'queued').length ?? 0;
  const wasQueued = useRef(queued);
  useEffect(() => {
    // A queued mail went out (or failed): the invoice's "sent on" may have changed with it.
    if (queued < wasQueued.current) void queryClient.invalidateQueries({ queryKey: invoiceKeys.detail(invoiceId) });
    wasQueued.current = queued;
  }, [queued, invoiceId, queryClient]);
  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="send-log-title">
      <Stack gap="sm">
        <Title order={2} fz="h3" id="send-log-title">
          E-mails
        </Title>
        {mails.isPending ? <Skeleton height={40} radius="md" /> : null}
        {mails.isError ? (
          <Alert color="red" title="The send log could not be loaded">
            {mails.error.message}
          </Alert>
        ) : null}
        {mails.data && mails.data.length === 0 ? (
          <Text size="sm" c="dimmed">
            Nothing sent yet.
          </Text>
        ) : null}
        {mails.data && mails.data.length > 0 ? (
          <Stack component="ul" gap="sm" style={{ listStyle: 'none', padding: 0, margin: 0 }} aria-label="Send log">
            {mails.data.map((mail) => (
              <li key={mail.id}>
                <Group gap={6} wrap="wrap">
                  <Badge size="sm" radius="sm" variant="light" color="gray">
                    {MAIL_KIND_LABELS[mail.kind]}
                  </Badge>
                  <Badge size="sm" radius="sm" color={STATUS_BADGES[mail.status].color}>
                    {STATUS_BADGES[mail.status].label}
                  </Badge>
                  <Text size="sm" c="dimmed">
                    {formatDateTime(mail.createdAt)}
                  </Text>
                </Group>
                <Text size="sm" style={{ overflowWrap: 'anywhere' }}>
                  To {mail.toEmail}: {mail.subject}
                </Text>
                {mail.error ? (
                  <Text size="sm" c="red.8" style={{ overflowWrap: 'anywhere' }}>
                    {mail.error}
                  </Text>
                ) : null}
              </li>
            ))}
          </Stack>
        ) : null}
      </Stack>
    </Card>
  );
}
