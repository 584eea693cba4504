import { ActionIcon, Button, Group, NumberInput, Paper, Select, Stack, Text } from '@mantine/core';
import { EDGE_TYPES, EDGE_TYPE_LABELS, TOOL_KINDS, TOOL_KIND_LABELS } from '@keenroute/shared';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { upperFirst } from '@/lib/format';
import { MAX_PAIRS_PER_ROW, MAX_ROWS, newRow, type ItemRow } from '../booking-rules';

const TOOL_KIND_OPTIONS = TOOL_KINDS.map((kind) => ({ value: kind, label: upperFirst(TOOL_KIND_LABELS[kind]) }));
const EDGE_TYPE_OPTIONS = EDGE_TYPES.map((edge) => ({ value: edge, label: upperFirst(EDGE_TYPE_LABELS[edge]) }));

interface ItemsEditorProps {
  rows: ItemRow[];
  onChange: (rows: ItemRow[]) => void;
  /** The form's errors, keyed "items.0.count" as the server's are. */
  errors: Record<string, ReactNode>;
  disabled?: boolean;
}

/** Rows of shears by tool kind and edge type, with how many pairs of each. */
export function ItemsEditor({ rows, onChange, errors, disabled = false }: ItemsEditorProps) {
  const change = (index: number, patch: Partial<ItemRow>) =>
    onChange(rows.map((row, at) => (at === index ? { ...row, ...patch } : row)));

  return (
    <Stack gap="sm">
      {rows.map((row, index) => (
        <Paper key={row.key} withBorder radius="md" p="sm" role="group" aria-label={`Shears row ${index + 1}`}>
          <Group align="flex-start" gap="sm" wrap="wrap">
            <Select
              label="Tool kind"
              data={TOOL_KIND_OPTIONS}
              value={row.toolKind || null}
              onChange={(value) => change(index, { toolKind: value ?? '' })}
              error={errors[`items.${index}.toolKind`]}
              allowDeselect={false}
              disabled={disabled}
              style={{ flex: '1 1 11rem' }}
            />
            <Select
              label="Edge type"
              data={EDGE_TYPE_OPTIONS}
              value={row.edgeType || null}
              onChange={(value) => change(index, { edgeType: value ?? '' })}
              error={errors[`items.${index}.edgeType`]}
              allowDeselect={false}
              disabled={disabled}
              style={{ flex: '1 1 9rem' }}
            />
            <Group align="flex-start" gap="xs" wrap="nowrap" style={{ flex: '0 0 auto' }}>
              <NumberInput
                label="Pairs"
                min={1}
                max={MAX_PAIRS_PER_ROW}
                allowDecimal={false}
                allowNegative={false}
                value={row.count}
                onChange={(value) => change(index, { count: value })}
                error={errors[`items.${index}.count`]}
                disabled={disabled}
                w={96}
                size="md"
              />
              <ActionIcon
                aria-label={`Remove row ${index + 1}`}
                color="red"
                mt={27}
                size={44}
                onClick={() => onChange(rows.filter((_, at) => at !== index))}
                disabled={disabled || rows.length === 1}
              >
                <IconTrash size={20} aria-hidden="true" />
              </ActionIcon>
            </Group>
          </Group>
        </Paper>
      ))}
      {errors.items ? (
        <Text c="red" size="sm" role="alert">
          {errors.items}
        </Text>
      ) : null}
      <Group justify="space-between" gap="sm">
        <Button
          variant="light"
          leftSection={<IconPlus size={18} aria-hidden="true" />}
          onClick={() => onChange([...rows, newRow()])}
          disabled={disabled || rows.length >= MAX_ROWS}
          mih={44}
        >
          Add another kind
        </Button>
        <Text size="sm" c="dimmed">
          Not sure of the edge type? Most hair shears are convex; the sharpener checks at the bench.
        </Text>
      </Group>
    </Stack>
  );
}
