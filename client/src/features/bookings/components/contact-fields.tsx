import { Checkbox, Stack, TextInput, Textarea } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import { NAME_MAX, NOTES_MAX } from '../booking-rules';
import type { BookingFormValues } from '../hooks/use-booking-form';

/** Off-screen rather than display:none, which some robots skip; people and screen readers never meet it. */
const HONEYPOT_STYLE = {
  position: 'absolute',
  left: '-10000px',
  top: 'auto',
  width: 1,
  height: 1,
  overflow: 'hidden',
} as const;

export function ContactFields({ form }: { form: UseFormReturnType<BookingFormValues> }) {
  return (
    <Stack gap="md">
      <TextInput label="Your name" autoComplete="name" maxLength={NAME_MAX} required {...form.getInputProps('name')} />
      <TextInput
        label="E-mail"
        type="email"
        autoComplete="email"
        description="The confirmation, with a link to change or cancel, goes here."
        required
        {...form.getInputProps('email')}
      />
      <TextInput
        label="Phone"
        type="tel"
        autoComplete="tel"
        description="For the sharpener to call on the day if needed."
        required
        {...form.getInputProps('phone')}
      />
      <Textarea
        label="Notes"
        description="Anything the sharpener should know: a nick in a blade, a shear that was dropped, where you leave them."
        minRows={3}
        maxLength={NOTES_MAX}
        size="md"
        {...form.getInputProps('notes')}
      />
      <div style={HONEYPOT_STYLE} aria-hidden="true" data-testid="honeypot">
        <label>
          Website
          <input type="text" name="website" tabIndex={-1} autoComplete="off" {...form.getInputProps('website')} />
        </label>
      </div>
      <Checkbox
        size="md"
        label="Keenroute may e-mail me about this drop-off: the booking e-mails and visit notices for this stop."
        {...form.getInputProps('consent', { type: 'checkbox' })}
      />
    </Stack>
  );
}
