import { Alert, Button, Card, Group, NumberInput, SimpleGrid, Stack, TextInput, Textarea, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { IconInfoCircle } from '@tabler/icons-react';
import { showFieldErrors } from '@/lib/form-errors';
import { useSaveBusinessProfile } from '../api/business-profile';
import {
  PAYMENT_TERMS_MAX,
  profileInput,
  profileValues,
  readReminderDays,
  termsProblem,
  type ProfileValues,
} from '../profile-rules';
import type { BusinessProfile } from '../types';
import { ReminderDaysField } from './reminder-days-field';

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** Who the invoices come from, and how long customers have to pay before reminders start. */
export function ProfileForm({ profile }: { profile: BusinessProfile }) {
  const save = useSaveBusinessProfile();
  const form = useForm<ProfileValues>({
    initialValues: profileValues(profile),
    validate: {
      name: (value) => (value.trim() ? null : 'The business name heads every invoice.'),
      email: (value) =>
        !value.trim() || EMAIL.test(value.trim()) ? null : 'Write an e-mail address like office@example.com.',
      country: (value) => (/^[A-Za-z]{2}$/.test(value.trim()) ? null : 'Two letters, like US or CA.'),
      paymentTermsDays: termsProblem,
      reminderDays: (value) => {
        const read = readReminderDays(value);
        return 'error' in read ? read.error : null;
      },
    },
  });

  const submit = form.onSubmit((values) => {
    const read = readReminderDays(values.reminderDays);
    if ('error' in read) return;
    const input = profileInput(values, read.days);
    save.mutate(input, {
      onSuccess: (saved) => {
        form.setValues(profileValues(saved));
        form.resetDirty(profileValues(saved));
        notifications.show({ color: 'keenTeal', title: 'Business profile saved', message: 'New invoices use it.' });
      },
      onError: (error) => void showFieldErrors(form, error),
    });
  });

  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="md">
        <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="profile-business-title">
          <Stack gap="sm">
            <Title order={2} fz="h3" id="profile-business-title">
              The business
            </Title>
            <TextInput label="Business name" required maxLength={120} {...form.getInputProps('name')} />
            <TextInput label="Street" maxLength={200} {...form.getInputProps('street')} />
            <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
              <TextInput label="City" maxLength={100} {...form.getInputProps('city')} />
              <TextInput label="State or region" maxLength={100} {...form.getInputProps('region')} />
              <TextInput label="Postal code" maxLength={20} {...form.getInputProps('postalCode')} />
              <TextInput label="Country (2 letters)" maxLength={2} {...form.getInputProps('country')} />
            </SimpleGrid>
          </Stack>
        </Card>

        <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="profile-contact-title">
          <Stack gap="sm">
            <Title order={2} fz="h3" id="profile-contact-title">
              Contact and tax
            </Title>
            <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm">
              <TextInput label="Phone" type="tel" maxLength={40} {...form.getInputProps('phone')} />
              <TextInput label="E-mail" type="email" maxLength={254} {...form.getInputProps('email')} />
              <TextInput label="Website" maxLength={200} {...form.getInputProps('website')} />
              <TextInput label="Tax ID" maxLength={40} {...form.getInputProps('taxId')} />
            </SimpleGrid>
            <Alert color="brass" variant="light" icon={<IconInfoCircle size={20} />} title="Tax">
              Whether sharpening services are taxable, and at what rate, depends on the jurisdiction: check local tax
              rules. Each stop carries its tax rate, and the rates say whether services are taxed.
            </Alert>
          </Stack>
        </Card>

        <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="profile-terms-title">
          <Stack gap="sm">
            <Title order={2} fz="h3" id="profile-terms-title">
              Payment terms and reminders
            </Title>
            <NumberInput
              label="Payment terms (days)"
              description="Days from the issue date to the due date."
              min={0}
              max={PAYMENT_TERMS_MAX}
              allowDecimal={false}
              allowNegative={false}
              maw={240}
              {...form.getInputProps('paymentTermsDays')}
            />
            <ReminderDaysField
              value={form.values.reminderDays}
              onChange={(days) => form.setFieldValue('reminderDays', days)}
              error={form.errors.reminderDays}
            />
            <Textarea
              label="Footer on the invoices"
              description="For example how to pay by cheque, or a thank-you."
              rows={2}
              maxLength={1000}
              {...form.getInputProps('invoiceFooter')}
            />
          </Stack>
        </Card>

        <Group justify="flex-end">
          <Button type="submit" loading={save.isPending}>
            Save the business profile
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
