import { Alert, Button, Card, Skeleton, Stack, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import type { ReactNode } from 'react';

export function ListLoading({ label }: { label: string }) {
  return (
    <Stack gap="sm" role="status" aria-label={label}>
      {Array.from({ length: 5 }, (_, index) => (
        <Skeleton key={index} height={48} radius="md" />
      ))}
    </Stack>
  );
}

export function ListLoadFailed({ title, message, onRetry }: { title: string; message: string; onRetry: () => void }) {
  return (
    <Alert color="red" icon={<IconAlertTriangle size={20} />} title={title}>
      <Stack gap="sm" align="flex-start">
        <Text size="sm">{message}</Text>
        <Button variant="white" color="red" onClick={onRetry}>
          Try again
        </Button>
      </Stack>
    </Alert>
  );
}

export function ListEmpty({ icon, title, children }: { icon: ReactNode; title: string; children?: ReactNode }) {
  return (
    <Card withBorder padding="xl" radius="lg">
      <Stack align="center" gap="sm" ta="center">
        {icon}
        <Text fw={600}>{title}</Text>
        {children}
      </Stack>
    </Card>
  );
}
