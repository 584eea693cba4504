import { useForm } from '@mantine/form';
import { useState } from 'react';
import { useChangeBooking } from '../api/change-booking';
import { PublicApiError } from '../api/public-request';
import { itemsOf, newRow, notesError, phoneError, validateRows, type ItemRow } from '../booking-rules';
import type { BookingChanges, PublicBooking, PublicDay } from '../types';
import { formErrorsFrom } from './server-errors';

export interface ManageFormValues {
  choice: string;
  items: ItemRow[];
  phone: string;
  notes: string;
}

const sameItems = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** The change form of a booking's private page: only what differs from the booking is sent. */
export function useManageForm(token: string, booking: PublicBooking, currentDayId: string) {
  const change = useChangeBooking(token);
  const [refusal, setRefusal] = useState<{ message: string; nextDay: PublicDay | null } | null>(null);
  const [saved, setSaved] = useState<'saved' | 'unchanged' | null>(null);
  const form = useForm<ManageFormValues>({
    initialValues: {
      choice: currentDayId,
      items: booking.items.map((item) => newRow(item)),
      phone: booking.phone,
      notes: booking.notes ?? '',
    },
    validate: (values) => ({
      ...validateRows(values.items),
      phone: phoneError(values.phone),
      notes: notesError(values.notes),
    }),
  });

  const changesOf = (values: ManageFormValues): BookingChanges => {
    const changes: BookingChanges = {};
    const items = itemsOf(values.items);
    if (items && !sameItems(items, booking.items)) changes.items = items;
    if (values.phone.trim() !== booking.phone) changes.phone = values.phone.trim();
    if (values.notes.trim() !== (booking.notes ?? '')) changes.notes = values.notes.trim();
    if (values.choice !== currentDayId) changes.routeDayId = values.choice;
    return changes;
  };

  const submit = form.onSubmit((values) => {
    setRefusal(null);
    setSaved(null);
    const changes = changesOf(values);
    if (Object.keys(changes).length === 0) {
      setSaved('unchanged');
      return;
    }
    change.mutate(changes, {
      onSuccess: () => setSaved('saved'),
      onError: (error) => {
        const fieldErrors = formErrorsFrom(error);
        if (Object.keys(fieldErrors).length > 0) form.setErrors(fieldErrors);
        if (error instanceof PublicApiError && error.status === 409) {
          setRefusal({ message: error.message, nextDay: error.nextDay });
        }
      },
    });
  });

  return { form, submit, pending: change.isPending, refusal, saved };
}
