import { NumberInput, SimpleGrid } from '@mantine/core';
import { ADD_ON_CODES, ADD_ON_LABELS, LENGTH_MAX_IN, LENGTH_MIN_IN, LENGTH_STEP_IN } from '@keenroute/shared';
import { upperFirst } from '@/lib/format';
import type { RateCardForm } from '../use-rate-card-form';
import { MoneyInput } from './money-input';

interface FieldsProps {
  rateCard: RateCardForm;
  readOnly: boolean;
}

function useMoneyField({ rateCard, readOnly }: FieldsProps) {
  const { form, errorOf } = rateCard;
  return (path: string) => ({
    currency: form.values.currency,
    readOnly,
    ...form.getInputProps(path),
    error: errorOf(path),
  });
}

/** Length and left-handed charges, the trip charge and the ticket minimum. */
export function ChargeFields(props: FieldsProps) {
  const { rateCard, readOnly } = props;
  const money = useMoneyField(props);
  return (
    <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="md">
      <NumberInput
        label="Length charge above (inches)"
        description="Shears longer than this carry the length charge."
        min={LENGTH_MIN_IN}
        max={LENGTH_MAX_IN}
        step={LENGTH_STEP_IN}
        decimalScale={2}
        clampBehavior="none"
        readOnly={readOnly}
        {...rateCard.form.getInputProps('lengthCharge.aboveIn')}
        error={rateCard.errorOf('lengthCharge.aboveIn')}
      />
      <MoneyInput
        label="Length charge per pair"
        description="Added per longer pair."
        {...money('lengthCharge.perPairCents')}
      />
      <MoneyInput
        label="Left-handed charge per pair"
        description="0 keeps left-handed shears at the same price."
        {...money('leftHandedCents')}
      />
      <MoneyInput
        label="Trip charge"
        description="Once per stop visit, on the ticket that carries it."
        {...money('tripChargeCents')}
      />
      <MoneyInput
        label="Ticket minimum"
        description="A ticket's shear work, after discount, is raised to this."
        {...money('ticketMinimumCents')}
      />
    </SimpleGrid>
  );
}

export function AddOnFields(props: FieldsProps) {
  const money = useMoneyField(props);
  return (
    <SimpleGrid cols={{ base: 1, xs: 2, md: 3 }} spacing="md">
      {ADD_ON_CODES.map((code) => (
        <MoneyInput key={code} label={upperFirst(ADD_ON_LABELS[code])} {...money(`addOnCents.${code}`)} />
      ))}
    </SimpleGrid>
  );
}
