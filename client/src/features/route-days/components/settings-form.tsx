import {
  Alert,
  Button,
  Checkbox,
  Group,
  NumberInput,
  SimpleGrid,
  Skeleton,
  Stack,
  Text,
  TextInput,
} from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { WEEKDAY_LABELS, WEEKDAYS } from '@keenroute/shared';
import { showFieldErrors } from '@/lib/form-errors';
import { usePlanningSettings, useSavePlanningSettings } from '../api/planning-settings';
import { settingsRules, settingsToValues, valuesToSettings, type SettingsFormValues } from '../settings-draft';
import type { PlanningSettings } from '../types';

/** The planning settings: the owner edits them, the office reads them. */
export function PlanningSettingsSection({ canEdit, onSaved }: { canEdit: boolean; onSaved?: () => void }) {
  const settings = usePlanningSettings();
  if (settings.isPending) return <Skeleton height={320} />;
  if (settings.isError) {
    return (
      <Alert color="red" title="The settings could not be loaded">
        {settings.error.message}
      </Alert>
    );
  }
  return <SettingsForm settings={settings.data} canEdit={canEdit} onSaved={onSaved} />;
}

interface SettingsFormProps {
  settings: PlanningSettings;
  canEdit: boolean;
  onSaved?: () => void;
}

export function SettingsForm({ settings, canEdit, onSaved }: SettingsFormProps) {
  const save = useSavePlanningSettings();
  const form = useForm<SettingsFormValues>({
    mode: 'controlled',
    initialValues: settingsToValues(settings),
    validate: settingsRules,
  });

  const submit = form.onSubmit((values) => {
    save.mutate(valuesToSettings(values), {
      onSuccess: (saved) => {
        form.setInitialValues(settingsToValues(saved));
        form.resetDirty(settingsToValues(saved));
        notifications.show({
          color: 'keenTeal',
          title: 'Planning settings saved',
          message: 'The next plan uses them.',
        });
        onSaved?.();
      },
      onError: (error) => void showFieldErrors(form, error),
    });
  });

  const time = (field: 'shiftStart' | 'latestFinish' | 'lunchEarliest' | 'lunchLatest', label: string) => (
    <TextInput label={label} placeholder="HH:MM" inputMode="numeric" maxLength={5} {...form.getInputProps(field)} />
  );

  return (
    <form onSubmit={submit} noValidate aria-label="Planning settings">
      <fieldset disabled={!canEdit} style={{ border: 0, padding: 0, margin: 0 }}>
        <Stack gap="md">
          {canEdit ? null : (
            <Text size="sm" c="dimmed">
              Only the owner changes these; you can read them.
            </Text>
          )}
          <TextInput label="Base (start and end of every day)" {...form.getInputProps('baseLabel')} />
          <SimpleGrid cols={2} spacing="sm">
            <NumberInput label="Latitude" decimalScale={6} {...form.getInputProps('baseLatitude')} />
            <NumberInput label="Longitude" decimalScale={6} {...form.getInputProps('baseLongitude')} />
          </SimpleGrid>
          <Checkbox.Group label="Work days" {...form.getInputProps('workWeekdays')}>
            <Group gap="sm" mt={6}>
              {WEEKDAYS.map((day) => (
                <Checkbox key={day} value={day} label={WEEKDAY_LABELS[day]} />
              ))}
            </Group>
          </Checkbox.Group>
          <SimpleGrid cols={2} spacing="sm">
            {time('shiftStart', 'Day starts')}
            {time('latestFinish', 'Latest finish')}
            {time('lunchEarliest', 'Earliest lunch')}
            {time('lunchLatest', 'Latest lunch')}
          </SimpleGrid>
          <SimpleGrid cols={2} spacing="sm">
            <NumberInput label="Lunch break (minutes)" allowDecimal={false} {...form.getInputProps('lunchMinutes')} />
            <NumberInput label="Notice to stops (days)" allowDecimal={false} {...form.getInputProps('noticeDays')} />
            <NumberInput
              label="Road circuity"
              description="Road km per straight-line km; 1.2 to 1.4 is usual."
              step={0.05}
              decimalScale={2}
              {...form.getInputProps('circuity')}
            />
            <NumberInput label="Average speed (km/h)" allowDecimal={false} {...form.getInputProps('averageSpeedKmh')} />
            <NumberInput
              label="Planning time (seconds)"
              description="How long the planner may search."
              allowDecimal={false}
              {...form.getInputProps('solveSeconds')}
            />
          </SimpleGrid>
          {canEdit ? (
            <Group justify="flex-end">
              <Button type="submit" loading={save.isPending}>
                Save settings
              </Button>
            </Group>
          ) : null}
        </Stack>
      </fieldset>
    </form>
  );
}
