import { useForm } from '@mantine/form';
import { useQueryClient } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { ApiError } from '@/lib/api-error';
import { bookingKeys } from '../api/keys';
import { useCreateBooking } from '../api/create-booking';
import { PublicApiError } from '../api/public-request';
import {
  MAIL_IN,
  emailError,
  itemsOf,
  nameError,
  newIdempotencyKey,
  newRow,
  notesError,
  phoneError,
  validateRows,
  type ItemRow,
} from '../booking-rules';
import type { CreateBookingInput, PublicBooking, PublicDay, PublicStop } from '../types';
import { formErrorsFrom } from './server-errors';

export interface BookingFormValues {
  choice: string;
  items: ItemRow[];
  name: string;
  email: string;
  phone: string;
  notes: string;
  consent: boolean;
  website: string;
}

export interface DayFull {
  message: string;
  nextDay: PublicDay | null;
}

interface Options {
  stop: PublicStop | undefined;
  /** A route day to start on, from a visit notice's link. */
  initialChoice?: string;
  prefill?: { name: string; email: string };
  withSession: boolean;
}

export function useBookingForm({ stop, initialChoice = '', prefill, withSession }: Options) {
  const queryClient = useQueryClient();
  const create = useCreateBooking({ withSession });
  // One key per filled-in form: a double click or a retry after a lost answer makes one booking, not two.
  const [idempotencyKey, setIdempotencyKey] = useState(newIdempotencyKey);
  const sending = useRef(false);
  const [created, setCreated] = useState<PublicBooking | null>(null);
  const [dayFull, setDayFull] = useState<DayFull | null>(null);
  // A day the server offered may be beyond the stop's listed days; it stays on the list once offered.
  const [offeredDay, setOfferedDay] = useState<PublicDay | null>(null);
  const [formError, setFormError] = useState<string | null>(null);

  const form = useForm<BookingFormValues>({
    initialValues: {
      choice: initialChoice,
      items: [newRow()],
      name: prefill?.name ?? '',
      email: prefill?.email ?? '',
      phone: '',
      notes: '',
      consent: false,
      website: '',
    },
    validate: (values) => ({
      choice: values.choice === '' ? 'Choose a route day, or mail-in.' : null,
      ...validateRows(values.items),
      name: nameError(values.name),
      email: emailError(values.email),
      phone: phoneError(values.phone),
      notes: notesError(values.notes),
      consent: values.consent ? null : 'Tick the box so we may send the booking e-mails for this drop-off.',
    }),
  });

  const onError = (error: Error, values: BookingFormValues) => {
    const fieldErrors = formErrorsFrom(error);
    if (Object.keys(fieldErrors).length > 0) form.setErrors(fieldErrors);
    if (error instanceof PublicApiError && error.status === 409) {
      const fromList = stop?.nextDays.find((day) => day.routeDayId === error.nextRouteDayId) ?? null;
      const nextDay = error.nextDay ?? fromList;
      const offer = nextDay?.routeDayId === values.choice ? null : nextDay;
      setDayFull({ message: error.message, nextDay: offer });
      if (offer) setOfferedDay(offer);
      // The day's bench time left has changed: show the days afresh.
      if (stop) void queryClient.invalidateQueries({ queryKey: bookingKeys.publicStop(stop.id) });
      return;
    }
    if (error instanceof ApiError && error.status !== 400) setFormError(error.message);
    else if (Object.keys(fieldErrors).length === 0) setFormError(error.message);
  };

  const submit = form.onSubmit((values) => {
    const items = itemsOf(values.items);
    if (!stop || !items || sending.current) return;
    sending.current = true;
    setDayFull(null);
    setFormError(null);
    const mailIn = values.choice === MAIL_IN;
    const notes = values.notes.trim();
    const input: CreateBookingInput = {
      stopId: stop.id,
      routeDayId: mailIn ? null : values.choice,
      mailIn,
      name: values.name.trim(),
      email: values.email.trim(),
      phone: values.phone.trim(),
      ...(notes ? { notes } : {}),
      consent: true,
      items,
      website: values.website,
      idempotencyKey,
    };
    create.mutate(input, {
      onSuccess: (answer) => setCreated(answer.booking),
      onError: (error) => onError(error, values),
      onSettled: () => {
        sending.current = false;
      },
    });
  });

  const takeNextDay = (day: PublicDay) => {
    form.setFieldValue('choice', day.routeDayId);
    form.clearFieldError('choice');
    setDayFull(null);
  };

  const startOver = () => {
    form.reset();
    setCreated(null);
    setDayFull(null);
    setOfferedDay(null);
    setFormError(null);
    setIdempotencyKey(newIdempotencyKey());
  };

  return {
    form,
    submit,
    pending: create.isPending,
    created,
    dayFull,
    offeredDay,
    formError,
    takeNextDay,
    startOver,
  };
}
