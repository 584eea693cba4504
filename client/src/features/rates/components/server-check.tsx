import { Alert, List, Text } from '@mantine/core';
import { formatMoney, type TicketPrice } from '@keenroute/shared';
import { IconChecks, IconServerBolt } from '@tabler/icons-react';
import { ApiError } from '@/lib/api-error';
import { quoteDifferences } from '../quote-lines';
import type { QuoteResponse } from '../types';

interface ServerCheckProps {
  /** The same ticket priced here by the shared rules, on the card the server holds. */
  expected: TicketPrice | null;
  answer: QuoteResponse | undefined;
  error: Error | null;
  /** The version the page loaded; the server may have a newer one. */
  savedVersion: number | null;
  /** The form holds changes the server does not have yet. */
  cardChanged: boolean;
}

/** What the server made of the ticket, and whether it agrees with the figures priced here. */
export function ServerCheck({ expected, answer, error, savedVersion, cardChanged }: ServerCheckProps) {
  if (error) {
    const fields = error instanceof ApiError ? Object.values(error.fields).flat() : [];
    return (
      <Alert
        color={error instanceof ApiError && error.status === 409 ? 'brass' : 'red'}
        title="The server did not quote"
      >
        <Text size="sm">{error.message}</Text>
        {fields.length > 0 ? (
          <List size="sm" mt={4}>
            {fields.map((message) => (
              <List.Item key={message}>{message}</List.Item>
            ))}
          </List>
        ) : null}
      </Alert>
    );
  }
  if (!answer) return null;

  const total = formatMoney(answer.price.totalCents, answer.price.currency);
  if (answer.version !== savedVersion) {
    return (
      <Alert
        color="brass"
        icon={<IconServerBolt size={20} aria-hidden="true" />}
        title="The server has another version"
      >
        The server priced the ticket at {total} with version {answer.version}; this page shows version{' '}
        {savedVersion ?? 'none'}. Reload the page to compare.
      </Alert>
    );
  }
  const differences = expected ? quoteDifferences(expected, answer.price) : ['the saved card could not price it here'];
  if (differences.length > 0) {
    return (
      <Alert color="red" title="The server's figures differ">
        <List size="sm">
          {differences.map((difference) => (
            <List.Item key={difference}>{difference}</List.Item>
          ))}
        </List>
      </Alert>
    );
  }
  return (
    <Alert color="keenTeal" icon={<IconChecks size={20} aria-hidden="true" />} title="The server agrees">
      Version {answer.version} prices this ticket at {total}, line by line the same figures as{' '}
      {cardChanged ? 'the saved card priced here. Your unsaved changes are not on the server yet.' : 'the preview.'}
    </Alert>
  );
}
