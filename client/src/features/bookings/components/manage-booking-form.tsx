import { Alert, Button, Loader, Stack, TextInput, Textarea, Title } from '@mantine/core';
import { IconCalendarX, IconCheck, IconDeviceFloppy } from '@tabler/icons-react';
import { usePublicStop } from '../api/get-public-stop';
import { NOTES_MAX } from '../booking-rules';
import { formatBookingDay, formatWindow } from '../format';
import { useLiveQuote } from '../hooks/use-live-quote';
import { useManageForm } from '../hooks/use-manage-form';
import type { PublicBooking, PublicDay } from '../types';
import { DayPicker } from './day-picker';
import { EstimateCard } from './estimate-card';
import { ItemsEditor } from './items-editor';

/** When the booking does not name its route day, the choice "stay where it is" has this value. */
const CURRENT_DAY = 'current';

function currentDayOf(booking: PublicBooking, days: PublicDay[]): PublicDay | null {
  if (booking.mailIn || !booking.day) return null;
  const listed = days.find((day) =>
    booking.routeDayId ? day.routeDayId === booking.routeDayId : day.day === booking.day,
  );
  if (listed) return listed;
  return {
    routeDayId: booking.routeDayId ?? CURRENT_DAY,
    day: booking.day,
    arrivalWindow: booking.arrivalWindow ?? { from: 0, to: 0 },
    bookableMinutesLeft: 0,
    cutoff: booking.cutoff ?? { date: booking.day, minute: 0 },
    open: true,
  };
}

interface ManageBookingFormProps {
  token: string;
  booking: PublicBooking;
}

function withDay(days: PublicDay[], day: PublicDay | null): PublicDay[] {
  if (!day || days.some((listed) => listed.routeDayId === day.routeDayId)) return days;
  return [...days, day].sort((a, b) => a.day.localeCompare(b.day));
}

/** Waits for the stop's open days, so the form starts from the booking's own route day. */
export function ManageBookingForm({ token, booking }: ManageBookingFormProps) {
  const stop = usePublicStop(booking.stop.id);
  if (stop.isPending && !booking.mailIn) return <Loader aria-label="Loading the open days" />;
  return <ChangeForm token={token} booking={booking} listed={stop.data?.nextDays ?? []} />;
}

function ChangeForm({ token, booking, listed }: ManageBookingFormProps & { listed: PublicDay[] }) {
  const current = currentDayOf(booking, listed);
  const manage = useManageForm(token, booking, current?.routeDayId ?? '');
  const { form } = manage;
  const estimate = useLiveQuote(booking.stop.id, form.values.items);
  const offered = manage.refusal?.nextDay ?? null;
  const days = withDay(withDay(listed, current), offered);

  return (
    <form onSubmit={manage.submit} noValidate aria-label="Change the drop-off">
      <Stack gap="lg">
        <Title order={2} fz="h3">
          Change the drop-off
        </Title>
        {current ? (
          <DayPicker
            label="Route day"
            days={days}
            mailInAddress={null}
            value={form.values.choice}
            onChange={(value) => form.setFieldValue('choice', value)}
            error={form.errors.choice}
            neededMinutes={estimate.quote?.benchMinutes ?? null}
            currentDayId={current.routeDayId}
          />
        ) : null}
        <ItemsEditor
          rows={form.values.items}
          onChange={(rows) => form.setFieldValue('items', rows)}
          errors={form.errors}
        />
        <EstimateCard quote={estimate.quote} loading={estimate.loading} waiting={estimate.waiting} />
        <TextInput label="Phone" type="tel" autoComplete="tel" required {...form.getInputProps('phone')} />
        <Textarea label="Notes" minRows={3} maxLength={NOTES_MAX} size="md" {...form.getInputProps('notes')} />
        {manage.refusal ? (
          <Alert color="brass" icon={<IconCalendarX size={20} />} title="Not changed">
            <Stack gap="sm" align="flex-start">
              {manage.refusal.message}
              {offered ? (
                <Button
                  color="brass"
                  h="auto"
                  py="xs"
                  styles={{ label: { whiteSpace: 'normal' } }}
                  mih={44}
                  onClick={() => form.setFieldValue('choice', offered.routeDayId)}
                >
                  Choose {formatBookingDay(offered.day)}, {formatWindow(offered.arrivalWindow)} instead
                </Button>
              ) : null}
            </Stack>
          </Alert>
        ) : null}
        {manage.saved ? (
          <Alert color="keenTeal" icon={<IconCheck size={20} />} role="status">
            {manage.saved === 'saved'
              ? 'Changes saved. The details above are up to date.'
              : 'Nothing to save: nothing was changed.'}
          </Alert>
        ) : null}
        <Button
          type="submit"
          loading={manage.pending}
          leftSection={<IconDeviceFloppy size={20} aria-hidden="true" />}
          mih={44}
        >
          Save the changes
        </Button>
      </Stack>
    </form>
  );
}
