import { Anchor, Card, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { formatDate } from '@/lib/format';
import type { CustomerDetail } from '../types';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <Stack gap={2}>
      <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
        {label}
      </Text>
      <Text size="sm" component="div" style={{ overflowWrap: 'anywhere' }}>
        {children}
      </Text>
    </Stack>
  );
}

const none = (
  <Text span c="dimmed" size="sm">
    Not recorded
  </Text>
);

export function CustomerFacts({ customer }: { customer: CustomerDetail }) {
  return (
    <Card withBorder radius="lg" padding="lg">
      <Title order={2} fz="h4" mb="sm">
        Details
      </Title>
      <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="md">
        <Fact label="E-mail">
          {customer.email ? <Anchor href={`mailto:${customer.email}`}>{customer.email}</Anchor> : none}
        </Fact>
        <Fact label="Phone">
          {customer.phone ? <Anchor href={`tel:${customer.phone}`}>{customer.phone}</Anchor> : none}
        </Fact>
        <Fact label="Visit notices">
          {customer.visitNoticeConsent ? 'Sent by e-mail before each visit' : 'Not sent (no consent recorded)'}
        </Fact>
        <Fact label="Signs in to Keenroute">{customer.user ? `Yes, as ${customer.user.email}` : 'No account'}</Fact>
        <Fact label="Status">{customer.active ? 'Active' : 'Inactive'}</Fact>
        <Fact label="Customer since">{formatDate(customer.createdAt)}</Fact>
      </SimpleGrid>
      {customer.notes ? (
        <Stack gap={2} mt="md">
          <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
            Notes
          </Text>
          <Text size="sm" style={{ whiteSpace: 'pre-line' }}>
            {customer.notes}
          </Text>
        </Stack>
      ) : null}
    </Card>
  );
}
