import { ActionIcon, Button, Group, Input, NumberInput, Stack } from '@mantine/core';
import { IconPlus, IconX } from '@tabler/icons-react';
import { REMINDER_DAY_MAX, REMINDER_STAGES_MAX } from '../profile-rules';

interface ReminderDaysFieldProps {
  value: (number | string)[];
  onChange: (value: (number | string)[]) => void;
  error?: React.ReactNode;
}

/** The days after the due date on which an unpaid invoice gets a reminder: a short list of numbers. */
export function ReminderDaysField({ value, onChange, error }: ReminderDaysFieldProps) {
  const set = (index: number, day: number | string) => onChange(value.map((old, at) => (at === index ? day : old)));
  return (
    <Input.Wrapper
      label="Reminders, days after the due date"
      description="Each unpaid invoice gets one reminder per day listed, once. Put in order on saving."
      error={error}
    >
      <Stack gap="xs" mt="xs">
        <Group gap="xs">
          {value.map((day, index) => (
            <Group key={index} gap={2} wrap="nowrap">
              <NumberInput
                aria-label={`Reminder ${index + 1}, days after the due date`}
                value={day}
                onChange={(next) => set(index, next)}
                min={1}
                max={REMINDER_DAY_MAX}
                allowDecimal={false}
                allowNegative={false}
                w={96}
                suffix=" d"
              />
              <ActionIcon
                variant="subtle"
                color="gray"
                aria-label={`Remove reminder ${index + 1}`}
                disabled={value.length <= 1}
                onClick={() => onChange(value.filter((_, at) => at !== index))}
              >
                <IconX size={18} />
              </ActionIcon>
            </Group>
          ))}
        </Group>
        {value.length < REMINDER_STAGES_MAX ? (
          <Button
            variant="subtle"
            size="sm"
            w="fit-content"
            leftSection={<IconPlus size={16} />}
            onClick={() => {
              const numbers = value.map(Number).filter((day) => Number.isInteger(day));
              const last = numbers.length > 0 ? Math.max(...numbers) : 0;
              onChange([...value, Math.min(REMINDER_DAY_MAX, last + 14)]);
            }}
          >
            Add a reminder
          </Button>
        ) : null}
      </Stack>
    </Input.Wrapper>
  );
}
