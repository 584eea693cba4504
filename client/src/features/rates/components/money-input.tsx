import { NumberInput, Text, type NumberInputProps } from '@mantine/core';
import { DEFAULT_LOCALE, currencyDigits } from '@keenroute/shared';
import { draftCurrency } from '../rate-card-draft';

function currencySymbol(currency: string): string {
  const parts = new Intl.NumberFormat(DEFAULT_LOCALE, { style: 'currency', currency }).formatToParts(0);
  return parts.find((part) => part.type === 'currency')?.value ?? currency;
}

/** An amount in the card's major unit (dollars); the form turns it into cents with the shared money rules. */
export function MoneyInput({ currency, ...props }: NumberInputProps & { currency: string }) {
  const code = draftCurrency(currency);
  const digits = currencyDigits(code);
  return (
    <NumberInput
      decimalScale={digits}
      fixedDecimalScale={digits > 0}
      hideControls
      inputMode="decimal"
      leftSection={
        <Text size="sm" c="dimmed" aria-hidden="true">
          {currencySymbol(code)}
        </Text>
      }
      {...props}
    />
  );
}
