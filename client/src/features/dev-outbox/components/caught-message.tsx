import { Box, Card, Group, Stack, Text, Title } from '@mantine/core';
import { formatDateTime } from '@/lib/format';
import type { CaughtMessage } from '../api/get-outbox';
import { LinkifiedText } from './linkified-text';

export function CaughtMessageCard({ message }: { message: CaughtMessage }) {
  return (
    <Card component="article" withBorder padding="lg" radius="lg">
      <Stack gap={4} mb="sm">
        <Group justify="space-between" align="flex-start" gap="xs">
          <Title order={2} fz="h4" style={{ overflowWrap: 'anywhere' }}>
            {message.subject || '(no subject)'}
          </Title>
          <Text size="sm" c="dimmed">
            <time dateTime={message.date}>{formatDateTime(message.date)}</time>
          </Text>
        </Group>
        <Text size="sm" c="dimmed" style={{ overflowWrap: 'anywhere' }}>
          To {message.to.join(', ')} · from {message.from}
        </Text>
      </Stack>
      <Box
        component="pre"
        m={0}
        p="md"
        bg="gray.0"
        style={{
          whiteSpace: 'pre-wrap',
          fontFamily: 'inherit',
          fontSize: 'var(--mantine-font-size-sm)',
          borderRadius: 'var(--mantine-radius-md)',
        }}
      >
        {message.text ? <LinkifiedText text={message.text} /> : <Text c="dimmed">This message has no text part.</Text>}
      </Box>
    </Card>
  );
}
