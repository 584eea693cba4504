import { Badge, Card, Group, Loader, Stack, Table, Text } from '@mantine/core';
import { formatMoney } from '@keenroute/shared';
import { formatMinutes } from '../format';
import type { Quote } from '../types';

interface EstimateCardProps {
  quote: Quote | undefined;
  loading: boolean;
  /** The rows are incomplete, so there is nothing to estimate yet. */
  waiting: boolean;
}

/** The live estimate from the rate card; always called an estimate, since the sharpener sets the price at the bench. */
export function EstimateCard({ quote, loading, waiting }: EstimateCardProps) {
  return (
    <Card withBorder radius="lg" padding="md" bg="brass.0" aria-live="polite" aria-label="Estimate">
      <Group justify="space-between" align="center" gap="sm">
        <Group gap="xs">
          <Text fw={700}>Estimated price</Text>
          <Badge color="brass" variant="filled">
            estimate
          </Badge>
        </Group>
        {loading ? <Loader size="sm" color="brass" aria-label="Working out the estimate" /> : null}
      </Group>
      {waiting || !quote ? (
        <Text size="sm" c="dimmed" mt="xs">
          {waiting ? 'Complete the rows of shears to see an estimate.' : 'Working out the estimate…'}
        </Text>
      ) : (
        <Stack gap="xs" mt="xs">
          <Text fz={28} fw={800} c="keenTeal.7" data-testid="estimate-total">
            {formatMoney(quote.estimateCents, quote.currency)}
          </Text>
          {quote.lines.length > 0 ? (
            <Table withRowBorders={false} verticalSpacing={4} fz="sm">
              <Table.Tbody>
                {quote.lines.map((line, index) => (
                  <Table.Tr key={`${line.label}-${index}`}>
                    <Table.Td pl={0}>{line.label}</Table.Td>
                    <Table.Td pr={0} ta="right" style={{ whiteSpace: 'nowrap' }}>
                      {formatMoney(line.cents, quote.currency)}
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          ) : null}
          <Text size="sm">About {formatMinutes(quote.benchMinutes)} of bench time.</Text>
          <Text size="sm" c="dimmed">
            {quote.taxNote} This is an estimate: the sharpener confirms the price when they see your shears.
          </Text>
        </Stack>
      )}
    </Card>
  );
}
