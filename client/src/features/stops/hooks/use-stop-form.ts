import { isEmail, useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { CADENCE_WEEKS_MAX, CADENCE_WEEKS_MIN, WEEKDAYS, type Weekday } from '@keenroute/shared';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { showFieldErrors } from '@/lib/form-errors';
import { useCreateStop } from '../api/create-stop';
import { useUpdateStop } from '../api/update-stop';
import {
  dayProblem,
  emptyStopValues,
  formPathOf,
  stopToValues,
  TAX_PERCENT_MAX,
  valuesToInput,
  type DayDraft,
  type StopFormValues,
} from '../stop-form-draft';
import type { GeocodeCandidate, GeocodeOutcome, SavedStop, StopDetail } from '../types';

/** What the person sees after a save that did not place the pin, on the create page's successor: the edit page. */
export interface StopEditState {
  geocoding: GeocodeOutcome;
}

export interface ServerProblem {
  message: string;
  /** Messages for fields the form does not show. */
  details: string[];
}

const FIELD_PATHS = new Set<string>([
  ...Object.keys(emptyStopValues()),
  ...WEEKDAYS.map((day) => `openingHours.${day}`),
]);

const required = (what: string) => (value: string) => (value.trim() ? null : `Enter the ${what}.`);

function coordinate(limit: number, name: string, other: 'latitude' | 'longitude') {
  return (value: number | '', values: StopFormValues) => {
    if (value === '' && values[other] === '') return null;
    if (value === '') return `Enter the ${name} too, or clear both.`;
    return Math.abs(value) <= limit ? null : `The ${name} is between -${limit} and ${limit}.`;
  };
}

const hoursRules = Object.fromEntries(
  WEEKDAYS.map((day) => [day, (value: DayDraft) => dayProblem(day, value)]),
) as Record<Weekday, (value: DayDraft) => string | null>;

// Mantine marks fields with aria-invalid once the errors render.
function focusFirstError() {
  requestAnimationFrame(() => document.querySelector<HTMLElement>('form [aria-invalid="true"]')?.focus());
}

function savedMessage(saved: SavedStop): string {
  if (saved.geocoding.message) return saved.geocoding.message;
  if (saved.geocoding.status === 'found') return 'The pin was placed from the address.';
  return `${saved.name} is saved.`;
}

export function useStopForm({ stop, initialGeocoding }: { stop?: StopDetail; initialGeocoding?: GeocodeOutcome }) {
  const navigate = useNavigate();
  const create = useCreateStop();
  const update = useUpdateStop();
  const [geocoding, setGeocoding] = useState<GeocodeOutcome | null>(initialGeocoding ?? null);
  const [picked, setPicked] = useState<GeocodeCandidate | null>(null);
  const [problem, setProblem] = useState<ServerProblem | null>(null);

  const form = useForm<StopFormValues>({
    mode: 'controlled',
    initialValues: stop ? stopToValues(stop) : emptyStopValues(),
    validate: {
      name: required('name of the stop'),
      street: required('street address'),
      city: required('city'),
      country: (value) => (/^[A-Za-z]{2}$/.test(value.trim()) ? null : 'Use the two-letter country code, like US.'),
      email: (value) => (value.trim() === '' ? null : isEmail('Enter an e-mail address, like desk@salon.test.')(value)),
      latitude: coordinate(90, 'latitude', 'longitude'),
      longitude: coordinate(180, 'longitude', 'latitude'),
      cadenceWeeks: (value) =>
        value !== '' && Number.isInteger(value) && value >= CADENCE_WEEKS_MIN && value <= CADENCE_WEEKS_MAX
          ? null
          : `Cadence is a whole number of weeks from ${CADENCE_WEEKS_MIN} to ${CADENCE_WEEKS_MAX}.`,
      taxPercent: (value) =>
        value === '' || (value >= 0 && value <= TAX_PERCENT_MAX) ? null : `Tax rate is 0 to ${TAX_PERCENT_MAX} %.`,
      openingHours: hoursRules,
    },
  });

  const pin = form.values;
  const pickedNow = picked !== null && pin.latitude === picked.latitude && pin.longitude === picked.longitude;

  const pick = (candidate: GeocodeCandidate) => {
    setPicked(candidate);
    form.setFieldValue('latitude', candidate.latitude);
    form.setFieldValue('longitude', candidate.longitude);
    form.clearFieldError('latitude');
    form.clearFieldError('longitude');
  };

  const placeServerErrors = (message: string, errors: Record<string, string>) => {
    const onFields: Record<string, string> = {};
    const details: string[] = [];
    for (const [field, text] of Object.entries(errors)) {
      const path = formPathOf(field);
      if (FIELD_PATHS.has(path)) onFields[path] = onFields[path] ? `${onFields[path]} ${text}` : text;
      else details.push(text);
    }
    form.setErrors(onFields);
    setProblem({ message, details });
    focusFirstError();
  };

  const afterSave = (saved: SavedStop) => {
    const { status } = saved.geocoding;
    if (status === 'ambiguous' || status === 'failed') {
      // Saved, but without a pin: stay on the form (as the edit page) so the pin can be placed now.
      if (!stop) {
        const state: StopEditState = { geocoding: saved.geocoding };
        void navigate(paths.stops.edit.getHref(saved.id), { replace: true, state });
        return;
      }
      const values = stopToValues(saved);
      form.setInitialValues(values);
      form.setValues(values);
      form.resetDirty(values);
      setGeocoding(saved.geocoding);
      setPicked(null);
      return;
    }
    notifications.show({ color: 'keenTeal', title: stop ? 'Stop saved' : 'Stop added', message: savedMessage(saved) });
    void navigate(paths.stops.detail.getHref(saved.id));
  };

  const onError = (error: Error) => {
    showFieldErrors({ setErrors: (errors) => placeServerErrors(error.message, errors) }, error);
  };

  const submit = form.onSubmit((values) => {
    setProblem(null);
    const input = valuesToInput(values, { saved: stop, picked: pickedNow });
    if (stop) update.mutate({ stopId: stop.id, input }, { onSuccess: afterSave, onError });
    else create.mutate(input, { onSuccess: afterSave, onError });
  }, focusFirstError);

  return {
    form,
    submit,
    saving: create.isPending || update.isPending,
    geocoding,
    picked: pickedNow ? picked : null,
    pick,
    problem,
    editing: stop !== undefined,
  };
}

export type StopFormState = ReturnType<typeof useStopForm>;
