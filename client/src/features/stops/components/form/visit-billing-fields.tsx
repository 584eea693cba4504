import { Chip, Group, Input, NumberInput, Radio, SimpleGrid, Stack } from '@mantine/core';
import { DatePickerInput } from '@mantine/dates';
import { useMediaQuery } from '@mantine/hooks';
import {
  CADENCE_WEEKS_MAX,
  CADENCE_WEEKS_MIN,
  DEFAULT_CADENCE_WEEKS,
  STOP_KIND_LABELS,
  WEEKDAYS,
} from '@keenroute/shared';
import { shortWeekday } from '../../format';
import type { StopFormState } from '../../hooks/use-stop-form';
import { TAX_PERCENT_MAX } from '../../stop-form-draft';
import { FormSection } from './form-section';

export function ClosedDatesField({ state }: { state: StopFormState }) {
  // On a phone the calendar opens full width in a modal, where every day is big enough to tap.
  const phone = useMediaQuery('(max-width: 36em)');
  return (
    <FormSection title="Closed dates" description="Holidays and refits: no visit is planned on these days.">
      <DatePickerInput
        type="multiple"
        label="Closed dates"
        placeholder="Pick the days"
        valueFormat="D MMM YYYY"
        clearable
        size="md"
        dropdownType={phone ? 'modal' : 'popover'}
        {...state.form.getInputProps('closedDates')}
      />
    </FormSection>
  );
}

export function VisitFields({ state }: { state: StopFormState }) {
  const { form } = state;
  const kind = form.values.kind;
  return (
    <FormSection title="Visits">
      <NumberInput
        label="Cadence in weeks"
        description={`Usual for a ${STOP_KIND_LABELS[kind]}: every ${DEFAULT_CADENCE_WEEKS[kind]} weeks.`}
        min={CADENCE_WEEKS_MIN}
        max={CADENCE_WEEKS_MAX}
        allowDecimal={false}
        clampBehavior="none"
        size="md"
        maw={260}
        {...form.getInputProps('cadenceWeeks')}
      />
      <Input.Wrapper
        label="Preferred weekdays"
        description="Days the stop likes to be visited; the planner tries these first."
        error={form.errors.preferredWeekdays}
      >
        <Chip.Group multiple {...form.getInputProps('preferredWeekdays')}>
          <Group gap="xs" mt="xs">
            {WEEKDAYS.map((day) => (
              <Chip key={day} value={day} size="md">
                {shortWeekday(day)}
              </Chip>
            ))}
          </Group>
        </Chip.Group>
      </Input.Wrapper>
    </FormSection>
  );
}

export function BillingFields({ state }: { state: StopFormState }) {
  const { form } = state;
  return (
    <FormSection title="Billing">
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="md">
        <Radio.Group label="Who pays" {...form.getInputProps('billingMode')}>
          <Stack gap="sm" mt="xs">
            <Radio value="customer" label="Each customer" description="Every stylist pays for their own shears." />
            <Radio value="stop" label="The stop" description="One invoice to the shop for everyone's shears." />
          </Stack>
        </Radio.Group>
        <NumberInput
          label="Tax rate"
          description="Whether sharpening is taxed depends on where the stop is: check your local tax rules."
          suffix=" %"
          decimalScale={2}
          min={0}
          max={TAX_PERCENT_MAX}
          clampBehavior="none"
          hideControls
          inputMode="decimal"
          size="md"
          {...form.getInputProps('taxPercent')}
        />
      </SimpleGrid>
    </FormSection>
  );
}
