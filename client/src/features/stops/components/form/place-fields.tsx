import { Select, SimpleGrid, TextInput } from '@mantine/core';
import { DEFAULT_CADENCE_WEEKS, STOP_KINDS, type StopKind } from '@keenroute/shared';
import { kindLabel } from '../../format';
import type { StopFormState } from '../../hooks/use-stop-form';
import { FormSection } from './form-section';

const KIND_CHOICES = STOP_KINDS.map((kind) => ({ value: kind, label: kindLabel(kind) }));

export function PlaceFields({ state }: { state: StopFormState }) {
  const { form } = state;
  const changeKind = (value: string | null) => {
    if (!value) return;
    const kind = value as StopKind;
    const { cadenceWeeks, kind: previous } = form.getValues();
    // The cadence follows the kind until someone sets it by hand.
    if (cadenceWeeks === '' || cadenceWeeks === DEFAULT_CADENCE_WEEKS[previous]) {
      form.setFieldValue('cadenceWeeks', DEFAULT_CADENCE_WEEKS[kind]);
    }
    form.setFieldValue('kind', kind);
  };

  return (
    <FormSection title="Place">
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="md">
        <TextInput label="Name" required autoComplete="off" {...form.getInputProps('name')} />
        <Select
          label="Kind"
          required
          data={KIND_CHOICES}
          allowDeselect={false}
          {...form.getInputProps('kind')}
          onChange={changeKind}
        />
      </SimpleGrid>
      <TextInput label="Street address" required autoComplete="off" {...form.getInputProps('street')} />
      <SimpleGrid cols={{ base: 1, xs: 2, md: 4 }} spacing="md">
        <TextInput label="City" required autoComplete="off" {...form.getInputProps('city')} />
        <TextInput label="State or region" autoComplete="off" {...form.getInputProps('region')} />
        <TextInput label="Postal code" autoComplete="off" {...form.getInputProps('postalCode')} />
        <TextInput
          label="Country"
          description="Two letters, like US"
          maxLength={2}
          autoComplete="off"
          {...form.getInputProps('country')}
        />
      </SimpleGrid>
    </FormSection>
  );
}

export function ContactFields({ state }: { state: StopFormState }) {
  const { form } = state;
  return (
    <FormSection title="Contact">
      <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="md">
        <TextInput label="Phone" type="tel" autoComplete="off" {...form.getInputProps('phone')} />
        <TextInput label="E-mail" type="email" autoComplete="off" {...form.getInputProps('email')} />
      </SimpleGrid>
    </FormSection>
  );
}
