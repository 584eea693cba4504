import { Switch, Textarea } from '@mantine/core';
import type { StopFormState } from '../../hooks/use-stop-form';
import type { Ref } from '../../types';
import { ManagerSelect } from '../manager-select';
import { SharpenerSelect } from '../sharpener-select';
import { FormSection } from './form-section';

export function AccessNoteFields({ state }: { state: StopFormState }) {
  const { form } = state;
  return (
    <FormSection title="Access notes" description="What the sharpener needs on arrival.">
      <Textarea label="Parking" rows={2} maxLength={500} {...form.getInputProps('accessParking')} />
      <Textarea label="Door" rows={2} maxLength={500} {...form.getInputProps('accessDoor')} />
      <Textarea label="Best time" rows={2} maxLength={500} {...form.getInputProps('accessBestTime')} />
    </FormSection>
  );
}

export function AssignmentFields({
  state,
  current,
  manager,
}: {
  state: StopFormState;
  current: Ref | null;
  manager: Ref | null;
}) {
  const { form } = state;
  return (
    <FormSection title="Sharpener and status">
      <SharpenerSelect
        label="Assigned sharpener"
        placeholder="Not assigned"
        current={current}
        maw={420}
        value={form.values.assignedSharpenerId}
        onChange={(userId) => form.setFieldValue('assignedSharpenerId', userId)}
        error={form.errors.assignedSharpenerId}
      />
      <ManagerSelect
        label="Shop manager"
        description="A client account that sees every customer and shear of this stop."
        placeholder="None"
        current={manager}
        maw={420}
        value={form.values.managerUserId}
        onChange={(userId) => form.setFieldValue('managerUserId', userId)}
        error={form.errors.managerUserId}
      />
      <Switch
        size="md"
        label="Active"
        description="An inactive stop stays on record but leaves coming due and the route."
        {...form.getInputProps('active', { type: 'checkbox' })}
      />
    </FormSection>
  );
}
