import { Group, NumberInput, SegmentedControl, Select, Stack, Text, TextInput, Textarea } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import {
  LENGTH_MAX_IN,
  LENGTH_MIN_IN,
  LENGTH_STEP_IN,
  type EdgeType,
  type Handedness,
  type ShearStatus,
  type ShearUse,
  type ToolKind,
} from '@keenroute/shared';
import type { ReactNode } from 'react';
import { EDGE_TYPE_OPTIONS, STATUS_OPTIONS, TOOL_KIND_OPTIONS } from '../labels';

export interface ShearValues {
  customerId: string | null;
  make: string;
  model: string;
  lengthIn: number | string;
  edgeType: EdgeType | null;
  toolKind: ToolKind | null;
  handedness: Handedness;
  use: ShearUse;
  notes: string;
  status: ShearStatus;
}

function Labelled({ id, label, children }: { id: string; label: string; children: ReactNode }) {
  return (
    <Stack gap={4}>
      <Text size="sm" fw={500} id={id}>
        {label}
      </Text>
      {children}
    </Stack>
  );
}

/** The shear's own fields, shared by registering and editing. */
export function ShearFields({ form, editing }: { form: UseFormReturnType<ShearValues>; editing: boolean }) {
  return (
    <>
      <Group grow align="flex-start" gap="md" wrap="wrap">
        <TextInput label="Make" autoComplete="off" miw={150} {...form.getInputProps('make')} />
        <TextInput label="Model" autoComplete="off" miw={150} {...form.getInputProps('model')} />
      </Group>
      <Group grow align="flex-start" gap="md" wrap="wrap">
        <NumberInput
          label="Length (inches)"
          description={`${LENGTH_MIN_IN} to ${LENGTH_MAX_IN}, in quarter inches`}
          required
          min={LENGTH_MIN_IN}
          max={LENGTH_MAX_IN}
          step={LENGTH_STEP_IN}
          decimalScale={2}
          // The server checks the quarter inches and says so in its own words; clamping would hide a typo.
          clampBehavior="none"
          inputMode="decimal"
          miw={150}
          {...form.getInputProps('lengthIn')}
        />
        <Select
          label="Edge type"
          required
          data={EDGE_TYPE_OPTIONS}
          allowDeselect={false}
          placeholder="Choose"
          miw={150}
          comboboxProps={{ withinPortal: true }}
          {...form.getInputProps('edgeType')}
        />
      </Group>
      <Select
        label="Tool kind"
        required
        data={TOOL_KIND_OPTIONS}
        allowDeselect={false}
        placeholder="Choose"
        comboboxProps={{ withinPortal: true }}
        {...form.getInputProps('toolKind')}
      />
      <Group gap="lg" align="flex-start" wrap="wrap">
        <Labelled id="shear-form-hand" label="Hand">
          <SegmentedControl
            aria-labelledby="shear-form-hand"
            data={[
              { value: 'right', label: 'Right-handed' },
              { value: 'left', label: 'Left-handed' },
            ]}
            {...form.getInputProps('handedness')}
          />
        </Labelled>
        <Labelled id="shear-form-use" label="Cuts">
          <SegmentedControl
            aria-labelledby="shear-form-use"
            data={[
              { value: 'hair', label: 'Hair' },
              { value: 'grooming', label: 'Grooming' },
            ]}
            {...form.getInputProps('use')}
          />
        </Labelled>
      </Group>
      {editing ? (
        <Select
          label="Status"
          data={STATUS_OPTIONS}
          allowDeselect={false}
          comboboxProps={{ withinPortal: true }}
          {...form.getInputProps('status')}
        />
      ) : null}
      <Textarea label="Notes" rows={3} {...form.getInputProps('notes')} />
    </>
  );
}
