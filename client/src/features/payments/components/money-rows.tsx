import { Group, Stack, Text } from '@mantine/core';
import type { ReactNode } from 'react';

export interface MoneyRow {
  label: ReactNode;
  value: string;
  /** The one figure the reader looks for: the balance due. */
  strong?: boolean;
  /** A line drawn above, between the lines and the totals. */
  ruleAbove?: boolean;
}

/** Label and amount rows as a description list, amounts right-aligned so they read down like a bill. */
export function MoneyRows({ rows }: { rows: MoneyRow[] }) {
  return (
    <Stack component="dl" gap={6} m={0}>
      {rows.map((row, index) => (
        <Group
          key={index}
          justify="space-between"
          align="baseline"
          gap="md"
          wrap="nowrap"
          pt={row.ruleAbove ? 8 : 0}
          mt={row.ruleAbove ? 2 : 0}
          style={row.ruleAbove ? { borderTop: '1px solid var(--mantine-color-gray-3)' } : undefined}
        >
          <Text component="dt" fw={row.strong ? 700 : 400} size={row.strong ? 'lg' : 'md'} style={{ minWidth: 0 }}>
            {row.label}
          </Text>
          <Text
            component="dd"
            m={0}
            fw={row.strong ? 700 : 500}
            size={row.strong ? 'lg' : 'md'}
            style={{ whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' }}
          >
            {row.value}
          </Text>
        </Group>
      ))}
    </Stack>
  );
}
