import { Alert, Badge, Card, Group, Skeleton, Stack, Text, Title } from '@mantine/core';
import { formatDateTime } from '@/lib/format';
import { useInvoiceMails } from '../api/get-invoice-mails';
import { MAIL_KIND_LABELS } from '../labels';

/** Every e-mail about this invoice (the invoice, reminders, receipts) and whether it went. */
export function SendLog({ invoiceId }: { invoiceId: string }) {
  const mails = useInvoiceMails(invoiceId);
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
                  <Badge size="sm" radius="sm" color={mail.status === 'sent' ? 'keenTeal' : 'red'}>
                    {mail.status === 'sent' ? 'Sent' : 'Failed'}
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
