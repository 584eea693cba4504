import { Badge, Group } from '@mantine/core';
import type { CustomerSummary } from '../types';

/** The few facts worth a badge: inactive, has an account, hears about visits. */
export function CustomerBadges({ customer }: { customer: CustomerSummary }) {
  return (
    <Group gap={6} wrap="wrap">
      {customer.active ? null : (
        <Badge color="gray" variant="outline" radius="sm">
          Inactive
        </Badge>
      )}
      {customer.hasAccount ? (
        <Badge color="keenTeal" variant="light" radius="sm">
          Signs in
        </Badge>
      ) : null}
      {customer.visitNoticeConsent ? (
        <Badge color="brass" variant="light" radius="sm">
          Visit notices
        </Badge>
      ) : null}
    </Group>
  );
}
