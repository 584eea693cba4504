import { Anchor, Badge, Button, Card, Divider, Group, List, Stack, Text, Title } from '@mantine/core';
import { IconMail, IconPhone, IconScissors } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { StopBookings } from '@/features/bookings/components/stop-bookings';
import { duration, timeOfDay, timeRange } from '../../format';
import type { SheetStop } from '../../types';

const ACCESS = [
  { field: 'accessParking', label: 'Parking' },
  { field: 'accessDoor', label: 'Door' },
  { field: 'accessBestTime', label: 'Best time' },
] as const;

function telHref(phone: string): string {
  return `tel:${phone.replace(/[^\d+]/g, '')}`;
}

/** One stop of the day sheet, big enough to read and tap on a phone at arm's length. */
export function SheetStopCard({ stop, routeDayId }: { stop: SheetStop; routeDayId: string }) {
  const notes = ACCESS.filter(({ field }) => stop[field].trim() !== '');
  const headingId = `sheet-stop-${stop.stopId}`;
  return (
    <Card component="li" withBorder radius="lg" padding="md" aria-labelledby={headingId}>
      <Stack gap="sm">
        <Group gap="sm" wrap="nowrap" align="flex-start">
          <Badge size="xl" circle color="keenTeal" aria-hidden="true">
            {stop.position + 1}
          </Badge>
          <Stack gap={2} style={{ minWidth: 0 }}>
            <Title order={2} fz="h3" id={headingId}>
              {stop.name}
            </Title>
            <Text size="lg" fw={600} c="keenTeal.7">
              Arrive {timeRange(stop.arrivalWindow.from, stop.arrivalWindow.to)}
            </Text>
            <Text size="sm" c="dimmed">
              Planned {timeOfDay(stop.arrival)}, leave {timeOfDay(stop.leave)}
            </Text>
          </Stack>
        </Group>

        <Text>
          {stop.street}
          <br />
          {[stop.postalCode, stop.city].filter(Boolean).join(' ')}
        </Text>

        {stop.phone || stop.email ? (
          <Stack gap={4}>
            {stop.phone ? <ContactLink kind="phone" value={stop.phone} label={`Call ${stop.name}`} /> : null}
            {stop.email ? <ContactLink kind="email" value={stop.email} label={`E-mail ${stop.name}`} /> : null}
          </Stack>
        ) : null}

        {notes.length > 0 ? (
          <Stack gap={2} component="dl" m={0}>
            {notes.map(({ field, label }) => (
              <Group key={field} gap={6} wrap="nowrap" align="baseline">
                <Text component="dt" fw={600} miw={80}>
                  {label}
                </Text>
                <Text component="dd" m={0}>
                  {stop[field]}
                </Text>
              </Group>
            ))}
          </Stack>
        ) : null}

        <Group gap="lg">
          <Text>
            <Text span fw={600}>
              {duration(stop.benchMinutes)}
            </Text>{' '}
            at the bench
          </Text>
          <Text>
            <Text span fw={600}>
              {stop.expectedPairs}
            </Text>{' '}
            {stop.expectedPairs === 1 ? 'pair' : 'pairs'} expected
          </Text>
        </Group>

        <Button
          component={Link}
          to={paths.routeDays.stopVisit.getHref(routeDayId, stop.stopId)}
          size="md"
          leftSection={<IconScissors size={20} aria-hidden="true" />}
          aria-label={`Work ${stop.name}`}
        >
          Work this stop
        </Button>

        <Divider />
        <Stack gap={4}>
          <Text fw={600}>Drop-offs booked</Text>
          <StopBookings bookings={stop.bookings} />
        </Stack>

        {stop.customers.length > 0 ? (
          <>
            <Divider />
            <Stack gap={4}>
              <Text fw={600}>Customers</Text>
              <List spacing={4} listStyleType="none" p={0} aria-label={`Customers at ${stop.name}`}>
                {stop.customers.map((customer) => (
                  <List.Item key={customer.id}>
                    <Group gap="sm" wrap="wrap" mih={44}>
                      <Text>
                        {customer.name}{' '}
                        <Text span c="dimmed" size="sm">
                          ({customer.shearCount} {customer.shearCount === 1 ? 'shear' : 'shears'})
                        </Text>
                      </Text>
                      {customer.phone ? (
                        <ContactLink kind="phone" value={customer.phone} label={`Call ${customer.name}`} />
                      ) : null}
                    </Group>
                  </List.Item>
                ))}
              </List>
            </Stack>
          </>
        ) : null}
      </Stack>
    </Card>
  );
}

function ContactLink({ kind, value, label }: { kind: 'phone' | 'email'; value: string; label: string }) {
  const Icon = kind === 'phone' ? IconPhone : IconMail;
  return (
    <Anchor
      href={kind === 'phone' ? telHref(value) : `mailto:${value}`}
      aria-label={`${label}: ${value}`}
      style={{ display: 'inline-flex', alignItems: 'center', gap: 8, minHeight: 44 }}
    >
      <Icon size={20} aria-hidden="true" />
      {value}
    </Anchor>
  );
}
