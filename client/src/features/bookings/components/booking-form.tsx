import { Alert, Button, Divider, Stack, Text, Title } from '@mantine/core';
import { IconAlertCircle, IconCalendarX, IconSend } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { MAIL_IN } from '../booking-rules';
import { formatBookingDay, formatWindow } from '../format';
import { useBookingForm } from '../hooks/use-booking-form';
import { useLiveQuote } from '../hooks/use-live-quote';
import type { PublicDay, PublicStop } from '../types';
import { BookingConfirmation } from './booking-confirmation';
import { ContactFields } from './contact-fields';
import { DayPicker } from './day-picker';
import { EstimateCard } from './estimate-card';
import { ItemsEditor } from './items-editor';

interface BookingFormProps {
  stop: PublicStop;
  /** "YYYY-MM-DD" from a visit notice's link. */
  linkedDay?: string | null;
  prefill?: { name: string; email: string };
  withSession?: boolean;
}

function Section({ step, title, children }: { step: number; title: string; children: ReactNode }) {
  return (
    <Stack gap="sm" component="section" aria-label={title}>
      <Title order={2} fz="h4">
        <Text span c="brass.7" fw={800} mr={6}>
          {step}.
        </Text>
        {title}
      </Title>
      {children}
    </Stack>
  );
}

function withOffered(days: PublicDay[], offered: PublicDay | null): PublicDay[] {
  if (!offered || days.some((day) => day.routeDayId === offered.routeDayId)) return days;
  return [...days, offered].sort((a, b) => a.day.localeCompare(b.day));
}

export function BookingForm({ stop, linkedDay, prefill, withSession = false }: BookingFormProps) {
  const linked = linkedDay ? stop.nextDays.find((day) => day.day === linkedDay) : undefined;
  const booking = useBookingForm({
    stop,
    initialChoice: linked?.open ? linked.routeDayId : '',
    prefill,
    withSession,
  });
  const { form } = booking;
  const estimate = useLiveQuote(stop.id, form.values.items);
  const offered = booking.dayFull?.nextDay ?? null;

  if (booking.created) return <BookingConfirmation booking={booking.created} onAnother={booking.startOver} />;

  const days = withOffered(stop.nextDays, booking.offeredDay);
  const needed = form.values.choice === MAIL_IN ? null : (estimate.quote?.benchMinutes ?? null);

  return (
    <form onSubmit={booking.submit} noValidate aria-label="Book a drop-off">
      <Stack gap="xl">
        <Section step={1} title="When">
          {linkedDay && !linked?.open ? (
            <Alert color="brass" icon={<IconCalendarX size={20} />}>
              {formatBookingDay(linkedDay)}, the day in your link, is no longer open for booking here. Choose another
              day, or mail-in.
            </Alert>
          ) : null}
          <DayPicker
            label="Route day or mail-in"
            days={days}
            mailInAddress={stop.mailIn.address}
            value={form.values.choice}
            onChange={(value) => form.setFieldValue('choice', value)}
            error={form.errors.choice}
            neededMinutes={needed}
          />
        </Section>

        <Section step={2} title="Your shears">
          <ItemsEditor
            rows={form.values.items}
            onChange={(rows) => form.setFieldValue('items', rows)}
            errors={form.errors}
          />
          <EstimateCard quote={estimate.quote} loading={estimate.loading} waiting={estimate.waiting} />
        </Section>

        <Section step={3} title="About you">
          <ContactFields form={form} />
        </Section>

        <Divider />

        {booking.dayFull ? (
          <Alert color="brass" icon={<IconCalendarX size={20} />} title="That day cannot take these shears">
            <Stack gap="sm" align="flex-start">
              <Text size="sm">{booking.dayFull.message}</Text>
              {offered ? (
                <Button
                  color="brass"
                  h="auto"
                  py="xs"
                  styles={{ label: { whiteSpace: 'normal' } }}
                  onClick={() => booking.takeNextDay(offered)}
                  mih={44}
                >
                  Choose {formatBookingDay(offered.day)}, {formatWindow(offered.arrivalWindow)} instead
                </Button>
              ) : (
                <Text size="sm">Choose another day above, or mail-in.</Text>
              )}
            </Stack>
          </Alert>
        ) : null}
        {booking.formError ? (
          <Alert color="red" icon={<IconAlertCircle size={20} />} title="Not booked yet">
            {booking.formError}
          </Alert>
        ) : null}

        <Button
          type="submit"
          size="lg"
          loading={booking.pending}
          disabled={booking.pending}
          leftSection={<IconSend size={20} aria-hidden="true" />}
          fullWidth
        >
          Book the drop-off
        </Button>
      </Stack>
    </form>
  );
}
