import { Table, Text } from '@mantine/core';
import { EDGE_TYPE_LABELS, EDGE_TYPES, TOOL_KIND_LABELS, TOOL_KINDS } from '@keenroute/shared';
import { upperFirst } from '@/lib/format';
import type { RateCardForm } from '../use-rate-card-form';
import { MoneyInput } from './money-input';

interface BasePriceGridProps {
  rateCard: RateCardForm;
  readOnly: boolean;
}

/** Price per pair, edge type down and tool kind across; on a phone the grid scrolls inside its own box. */
export function BasePriceGrid({ rateCard, readOnly }: BasePriceGridProps) {
  const { form, errorOf } = rateCard;
  return (
    <Table.ScrollContainer minWidth={720} type="native">
      <Table verticalSpacing="xs" horizontalSpacing="xs" withRowBorders={false}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={110}>Edge type</Table.Th>
            {TOOL_KINDS.map((kind) => (
              <Table.Th key={kind}>
                <Text size="sm" fw={700}>
                  {upperFirst(TOOL_KIND_LABELS[kind])}
                </Text>
              </Table.Th>
            ))}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {EDGE_TYPES.map((edge) => (
            <Table.Tr key={edge}>
              <Table.Th scope="row">{upperFirst(EDGE_TYPE_LABELS[edge])}</Table.Th>
              {TOOL_KINDS.map((kind) => {
                const path = `basePerPairCents.${edge}.${kind}`;
                return (
                  <Table.Td key={kind} style={{ verticalAlign: 'top' }}>
                    <MoneyInput
                      currency={form.values.currency}
                      aria-label={`Base price, ${EDGE_TYPE_LABELS[edge]} ${TOOL_KIND_LABELS[kind]}`}
                      size="sm"
                      readOnly={readOnly}
                      {...form.getInputProps(path)}
                      error={errorOf(path)}
                    />
                  </Table.Td>
                );
              })}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
