import { Alert, Button, Card, Skeleton, Stack, Text } from '@mantine/core';
import { IconMailOff, IconRefresh } from '@tabler/icons-react';
import { PageHeader } from '@/components/page-header';
import { ApiError } from '@/lib/api-error';
import { useOutbox } from '../api/get-outbox';
import { CaughtMessageCard } from '../components/caught-message';

export function OutboxRoute() {
  const outbox = useOutbox();
  const catcherDown = outbox.error instanceof ApiError && outbox.error.status === 404;

  return (
    <Stack gap="md" maw={900}>
      <PageHeader
        title="Outbox"
        description="E-mails Keenroute sent while the local mail catcher runs, newest first. Nothing here left this machine."
        actions={
          <Button
            variant="default"
            leftSection={<IconRefresh size={18} />}
            onClick={() => void outbox.refetch()}
            loading={outbox.isFetching}
          >
            Refresh
          </Button>
        }
      />
      {outbox.isPending ? (
        <Stack gap="sm" role="status" aria-label="Loading the outbox">
          <Skeleton height={140} radius="lg" />
          <Skeleton height={140} radius="lg" />
        </Stack>
      ) : catcherDown ? (
        <Alert color="brass" icon={<IconMailOff size={20} />} title="The mail catcher is not running">
          The outbox only works when Keenroute runs with its local stand-ins (npm start or npm test).
        </Alert>
      ) : outbox.isError ? (
        <Alert color="red" title="The outbox could not be loaded">
          {outbox.error.message}
        </Alert>
      ) : outbox.data.items.length === 0 ? (
        <Card withBorder padding="xl" radius="lg">
          <Text ta="center" c="dimmed">
            No e-mails yet. Invitations and password resets appear here as they are sent.
          </Text>
        </Card>
      ) : (
        <Stack gap="md">
          <Text size="sm" c="dimmed">
            {outbox.data.total} {outbox.data.total === 1 ? 'e-mail' : 'e-mails'}
          </Text>
          {outbox.data.items.map((message) => (
            <CaughtMessageCard key={message.id} message={message} />
          ))}
        </Stack>
      )}
    </Stack>
  );
}
