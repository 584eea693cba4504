import {
  ActionIcon,
  Group,
  MultiSelect,
  NumberInput,
  Paper,
  SegmentedControl,
  Select,
  SimpleGrid,
  Text,
} from '@mantine/core';
import {
  ADD_ON_CODES,
  ADD_ON_LABELS,
  EDGE_TYPE_LABELS,
  EDGE_TYPES,
  LENGTH_MAX_IN,
  LENGTH_MIN_IN,
  LENGTH_STEP_IN,
  TOOL_KIND_LABELS,
  TOOL_KINDS,
  isAddOnCode,
  isEdgeType,
  isToolKind,
} from '@keenroute/shared';
import { IconTrash } from '@tabler/icons-react';
import { upperFirst } from '@/lib/format';
import type { QuoteLineDraft } from '../quote-lines';

const EDGE_CHOICES = EDGE_TYPES.map((value) => ({ value, label: upperFirst(EDGE_TYPE_LABELS[value]) }));
const KIND_CHOICES = TOOL_KINDS.map((value) => ({ value, label: upperFirst(TOOL_KIND_LABELS[value]) }));
const ADD_ON_CHOICES = ADD_ON_CODES.map((value) => ({ value, label: upperFirst(ADD_ON_LABELS[value]) }));

interface QuoteLineEditorProps {
  line: QuoteLineDraft;
  number: number;
  onChange: (line: QuoteLineDraft) => void;
  onRemove: () => void;
}

export function QuoteLineEditor({ line, number, onChange, onRemove }: QuoteLineEditorProps) {
  const change = (edit: Partial<QuoteLineDraft>) => onChange({ ...line, ...edit });
  return (
    <Paper component="li" withBorder radius="md" p="sm" aria-label={`Shear ${number}`}>
      <Group justify="space-between" mb="xs">
        <Text fw={700}>Shear {number}</Text>
        <ActionIcon color="red" size="lg" aria-label={`Remove shear ${number}`} onClick={onRemove}>
          <IconTrash size={18} aria-hidden="true" />
        </ActionIcon>
      </Group>
      <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="sm">
        <Select
          label="Edge type"
          size="sm"
          data={EDGE_CHOICES}
          value={line.edgeType}
          allowDeselect={false}
          onChange={(value) => isEdgeType(value) && change({ edgeType: value })}
        />
        <Select
          label="Tool kind"
          size="sm"
          data={KIND_CHOICES}
          value={line.toolKind}
          allowDeselect={false}
          onChange={(value) => isToolKind(value) && change({ toolKind: value })}
        />
        <NumberInput
          label="Length (inches)"
          size="sm"
          min={LENGTH_MIN_IN}
          max={LENGTH_MAX_IN}
          step={LENGTH_STEP_IN}
          decimalScale={2}
          clampBehavior="none"
          value={line.lengthIn}
          onChange={(value) => change({ lengthIn: value })}
        />
        <div>
          <Text size="sm" fw={500} mb={4} id={`${line.key}-hand`}>
            Hand
          </Text>
          <SegmentedControl
            aria-labelledby={`${line.key}-hand`}
            fullWidth
            value={line.handedness}
            onChange={(value) => change({ handedness: value === 'left' ? 'left' : 'right' })}
            data={[
              { value: 'right', label: 'Right' },
              { value: 'left', label: 'Left' },
            ]}
          />
        </div>
      </SimpleGrid>
      <MultiSelect
        mt="sm"
        size="sm"
        label="Add-ons"
        placeholder={line.addOns.length === 0 ? 'None' : undefined}
        data={ADD_ON_CHOICES}
        value={line.addOns}
        onChange={(values) => change({ addOns: values.filter(isAddOnCode) })}
        clearable
      />
    </Paper>
  );
}
