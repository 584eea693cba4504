import type { BusinessProfile, BusinessProfileInput } from './types';

export const REMINDER_STAGES_MAX = 5;
export const REMINDER_DAY_MAX = 365;
export const PAYMENT_TERMS_MAX = 120;

/**
 * The reminder days as the API takes them (1 to 5 whole days from 1 to 365, ascending, each once), put in order for
 * the person; or what is wrong, in words.
 */
export function readReminderDays(values: readonly (number | string)[]): { days: number[] } | { error: string } {
  if (values.length === 0) return { error: 'Keep at least one reminder day.' };
  if (values.length > REMINDER_STAGES_MAX) return { error: `At most ${REMINDER_STAGES_MAX} reminders.` };
  const days = values.map((value) => (typeof value === 'number' ? value : Number(value.trim() || Number.NaN)));
  if (days.some((day) => !Number.isInteger(day) || day < 1 || day > REMINDER_DAY_MAX)) {
    return { error: `Each reminder day is a whole number from 1 to ${REMINDER_DAY_MAX}.` };
  }
  if (new Set(days).size !== days.length) return { error: 'Each reminder day can be there only once.' };
  return { days: [...days].sort((a, b) => a - b) };
}

export function termsProblem(value: number | string): string | null {
  // An empty field would read as 0 (due on the issue date): ask rather than guess.
  const days = typeof value === 'number' ? value : value.trim() === '' ? Number.NaN : Number(value);
  return Number.isInteger(days) && days >= 0 && days <= PAYMENT_TERMS_MAX
    ? null
    : `Payment terms are a whole number of days from 0 to ${PAYMENT_TERMS_MAX}.`;
}

export type ProfileValues = Omit<BusinessProfileInput, 'paymentTermsDays' | 'reminderDays'> & {
  paymentTermsDays: number | string;
  reminderDays: (number | string)[];
};

export function profileValues(profile: BusinessProfile): ProfileValues {
  return {
    name: profile.name,
    street: profile.street,
    city: profile.city,
    region: profile.region,
    postalCode: profile.postalCode,
    country: profile.country,
    phone: profile.phone,
    email: profile.email,
    website: profile.website,
    taxId: profile.taxId,
    invoiceFooter: profile.invoiceFooter,
    paymentTermsDays: profile.paymentTermsDays,
    reminderDays: [...profile.reminderDays],
  };
}

/** The PUT body: only the fields the API takes (it refuses any other), trimmed. */
export function profileInput(values: ProfileValues, reminderDays: number[]): BusinessProfileInput {
  const text = (value: string) => value.trim();
  return {
    name: text(values.name),
    street: text(values.street),
    city: text(values.city),
    region: text(values.region),
    postalCode: text(values.postalCode),
    country: text(values.country).toUpperCase(),
    phone: text(values.phone),
    email: text(values.email),
    website: text(values.website),
    taxId: text(values.taxId),
    invoiceFooter: text(values.invoiceFooter),
    paymentTermsDays: Number(values.paymentTermsDays),
    reminderDays,
  };
}
