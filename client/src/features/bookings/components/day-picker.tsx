import { Badge, Group, Radio, Stack, Text } from '@mantine/core';
import { IconMailForward } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { MAIL_IN } from '../booking-rules';
import { formatBookingDay, formatCutoff, formatMinutes, formatWindow } from '../format';
import type { PublicDay } from '../types';

interface DayPickerProps {
  days: PublicDay[];
  mailInAddress: string | null;
  value: string;
  onChange: (value: string) => void;
  error?: ReactNode;
  /** Bench minutes the shears need, when the estimate knows it: days with less left cannot take them. */
  neededMinutes: number | null;
  label?: string;
  /** The day a booking is already on: its own bench time is counted there, so it stays open to it. */
  currentDayId?: string;
}

/** Why a day cannot be chosen, or null when it can. */
export function closedReason(day: PublicDay, neededMinutes: number | null): string | null {
  if (!day.open) {
    return day.bookableMinutesLeft <= 0
      ? 'Full: no bench time left on this day.'
      : `Booking closed at ${formatCutoff(day.cutoff)}.`;
  }
  if (neededMinutes !== null && neededMinutes > day.bookableMinutesLeft) {
    return `Not enough bench time left for these shears (${formatMinutes(day.bookableMinutesLeft)} left).`;
  }
  return null;
}

function DayCard({ day, reason, checked }: { day: PublicDay; reason: string | null; checked: boolean }) {
  return (
    <Radio.Card
      value={day.routeDayId}
      disabled={reason !== null}
      radius="md"
      p="md"
      mih={44}
      aria-label={`${formatBookingDay(day.day)}, ${formatWindow(day.arrivalWindow)}`}
      style={reason ? { opacity: 0.6, cursor: 'not-allowed' } : undefined}
      bg={checked ? 'keenTeal.0' : undefined}
    >
      <Group wrap="nowrap" align="flex-start" gap="sm">
        <Radio.Indicator disabled={reason !== null} mt={4} />
        <div>
          <Text fw={700}>{formatBookingDay(day.day)}</Text>
          <Text size="sm">Sharpener expected {formatWindow(day.arrivalWindow)}</Text>
          {reason ? (
            <Text size="sm" c="red.8">
              {reason}
            </Text>
          ) : (
            <Text size="sm" c="dimmed">
              Leave your shears by then; changes close at {formatCutoff(day.cutoff)}.
            </Text>
          )}
        </div>
      </Group>
    </Radio.Card>
  );
}

/** The stop's next route days, and mail-in, as large choices; days that cannot take the booking say why. */
export function DayPicker(props: DayPickerProps) {
  const { days, mailInAddress, value, onChange, error, neededMinutes, label, currentDayId } = props;
  return (
    <Radio.Group
      label={label ?? 'When'}
      description={days.length === 0 ? 'No route days are planned at this stop yet.' : undefined}
      value={value}
      onChange={onChange}
      error={error}
    >
      <Stack gap="sm" mt="xs">
        {days.map((day) => (
          <DayCard
            key={day.routeDayId}
            day={day}
            reason={day.routeDayId === currentDayId ? null : closedReason(day, neededMinutes)}
            checked={value === day.routeDayId}
          />
        ))}
        {mailInAddress !== null ? (
          <Radio.Card
            value={MAIL_IN}
            radius="md"
            p="md"
            mih={44}
            aria-label="Mail in"
            bg={value === MAIL_IN ? 'keenTeal.0' : undefined}
          >
            <Group wrap="nowrap" align="flex-start" gap="sm">
              <Radio.Indicator mt={4} />
              <div>
                <Group gap="xs">
                  <Text fw={700}>Mail in</Text>
                  <IconMailForward size={18} aria-hidden="true" />
                  <Badge color="brass" variant="light">
                    any time
                  </Badge>
                </Group>
                <Text size="sm" c="dimmed">
                  Post your shears to us; we send them back sharpened.
                </Text>
                {value === MAIL_IN ? (
                  <Text size="sm" mt="xs" style={{ whiteSpace: 'pre-line' }} data-testid="mail-in-address">
                    Send them to: {mailInAddress}
                  </Text>
                ) : null}
              </div>
            </Group>
          </Radio.Card>
        ) : null}
      </Stack>
    </Radio.Group>
  );
}
