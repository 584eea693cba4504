import { ActionIcon, Button, Group, Stack, Switch, Text } from '@mantine/core';
import { TimeInput } from '@mantine/dates';
import { IconCopy, IconPlus, IconTrash } from '@tabler/icons-react';
import { WEEKDAY_LABELS, WEEKDAYS, WINDOWS_PER_DAY_MAX, type Weekday } from '@keenroute/shared';
import type { StopFormState } from '../../hooks/use-stop-form';
import { copyMondayToWeekdays, DEFAULT_WINDOW } from '../../stop-form-draft';
import { FormSection } from './form-section';

function DayEditor({ state, day }: { state: StopFormState; day: Weekday }) {
  const { form } = state;
  const label = WEEKDAY_LABELS[day];
  const value = form.values.openingHours[day];
  const path = `openingHours.${day}` as const;
  const error = form.errors[path] ?? (day === 'mon' ? form.errors.openingHours : undefined);

  const setOpen = (open: boolean) => {
    form.setFieldValue(`${path}.open`, open);
    if (open && value.windows.length === 0) form.setFieldValue(`${path}.windows`, [{ ...DEFAULT_WINDOW }]);
    form.clearFieldError(path);
  };

  return (
    <Stack gap="xs" py="xs" style={{ borderTop: day === 'mon' ? undefined : '1px solid var(--mantine-color-gray-2)' }}>
      <Group justify="space-between" wrap="nowrap">
        <Text fw={600} id={`hours-${day}`}>
          {label}
        </Text>
        <Switch
          size="md"
          label={value.open ? 'Open' : 'Closed'}
          checked={value.open}
          onChange={(event) => setOpen(event.currentTarget.checked)}
          aria-label={`${label} open`}
        />
      </Group>
      {value.open
        ? value.windows.map((_, index) => (
            <Group key={index} gap={6} wrap="nowrap" align="center">
              <TimeInput
                aria-label={`${label} window ${index + 1} opens`}
                size="md"
                style={{ flex: '1 1 0', minWidth: 0 }}
                {...form.getInputProps(`${path}.windows.${index}.opens`)}
              />
              <Text size="sm" c="dimmed" aria-hidden="true">
                –
              </Text>
              <TimeInput
                aria-label={`${label} window ${index + 1} closes`}
                size="md"
                style={{ flex: '1 1 0', minWidth: 0 }}
                {...form.getInputProps(`${path}.windows.${index}.closes`)}
              />
              <ActionIcon
                color="red"
                aria-label={`Remove ${label} window ${index + 1}`}
                onClick={() => {
                  form.removeListItem(`${path}.windows`, index);
                  if (value.windows.length === 1) form.setFieldValue(`${path}.open`, false);
                }}
              >
                <IconTrash size={20} aria-hidden="true" />
              </ActionIcon>
            </Group>
          ))
        : null}
      {value.open && value.windows.length < WINDOWS_PER_DAY_MAX ? (
        <Group>
          <Button
            variant="subtle"
            size="sm"
            leftSection={<IconPlus size={16} />}
            onClick={() => {
              const last = value.windows.at(-1);
              // A second window usually follows a lunch close: start it an hour after the first one closes.
              const opens = last ? laterBy(last.closes, 60) : DEFAULT_WINDOW.opens;
              form.insertListItem(`${path}.windows`, { opens, closes: laterBy(opens, 240) });
            }}
            aria-label={`Add a ${label} window`}
          >
            Add a window
          </Button>
        </Group>
      ) : null}
      {error ? (
        <Text size="sm" c="red" role="alert">
          {error}
        </Text>
      ) : null}
    </Stack>
  );
}

function laterBy(time: string, minutes: number): string {
  const [hours = 0, mins = 0] = time.split(':').map(Number);
  const total = Math.min(23 * 60 + 59, hours * 60 + mins + minutes);
  return `${String(Math.floor(total / 60)).padStart(2, '0')}:${String(total % 60).padStart(2, '0')}`;
}

export function OpeningHoursEditor({ state }: { state: StopFormState }) {
  const { form } = state;
  return (
    <FormSection
      title="Opening hours"
      description="Visits are planned inside these windows. A day with a lunch close has two windows."
    >
      <Group>
        <Button
          variant="light"
          size="sm"
          leftSection={<IconCopy size={16} />}
          onClick={() => form.setFieldValue('openingHours', copyMondayToWeekdays(form.getValues().openingHours))}
        >
          Copy Monday to weekdays
        </Button>
      </Group>
      <div>
        {WEEKDAYS.map((day) => (
          <DayEditor key={day} state={state} day={day} />
        ))}
      </div>
    </FormSection>
  );
}
