import { SegmentedControl, Stack, TextInput } from '@mantine/core';
import type { DiscountFields } from '../discount';

interface DiscountFieldProps {
  value: DiscountFields;
  onChange: (value: DiscountFields) => void;
  error?: string | null;
  currency: string;
}

/** No discount, a share of the lines, or an amount; taken off before tax. */
export function DiscountField({ value, onChange, error, currency }: DiscountFieldProps) {
  return (
    <Stack gap="xs">
      <SegmentedControl
        aria-label="Discount"
        fullWidth
        value={value.mode}
        onChange={(mode) => onChange({ mode, value: mode === value.mode ? value.value : '' })}
        data={[
          { value: 'none', label: 'No discount' },
          { value: 'percent', label: 'Percent' },
          { value: 'amount', label: 'Amount' },
        ]}
      />
      {value.mode !== 'none' ? (
        <TextInput
          label={value.mode === 'percent' ? 'Discount (%)' : `Discount (${currency})`}
          description="Taken off the lines before tax."
          inputMode="decimal"
          autoComplete="off"
          value={value.value}
          onChange={(event) => onChange({ ...value, value: event.currentTarget.value })}
          error={error}
        />
      ) : null}
    </Stack>
  );
}
