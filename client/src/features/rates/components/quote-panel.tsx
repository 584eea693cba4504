import { Alert, Button, Card, Divider, Group, NumberInput, Stack, Switch, Text, Title } from '@mantine/core';
import { TAX_RATE_MAX_BP, TICKET_LINES_MAX, type RateCard } from '@keenroute/shared';
import { IconCalculator, IconPlus } from '@tabler/icons-react';
import { useEffect, useMemo, useState } from 'react';
import { useQuoteTicket } from '../api/quote-ticket';
import { newQuoteLine, previewQuote, quoteRequest, type QuoteLineDraft, type QuoteSettings } from '../quote-lines';
import { QuoteLineEditor } from './quote-line-editor';
import { QuotePreview } from './quote-preview';
import { ServerCheck } from './server-check';

export interface QuotePanelProps {
  /** The card the preview prices with: the form's, while every field of it is valid; otherwise null. */
  card: RateCard | null;
  /** The card the server holds (as this page loaded it), which its quote uses. */
  savedCard: RateCard;
  savedVersion: number | null;
  /** The form's card differs from the saved one. */
  cardChanged: boolean;
}

/** Prices a ticket instantly with the shared rules, and asks the server to price the same ticket to compare. */
export function QuotePanel({ card, savedCard, savedVersion, cardChanged }: QuotePanelProps) {
  const [settings, setSettings] = useState<QuoteSettings>(() => ({
    lines: [newQuoteLine()],
    taxPercent: 0,
    chargeTrip: false,
  }));
  const request = useMemo(() => quoteRequest(settings), [settings]);
  const preview = useMemo(() => (card ? previewQuote(request, card) : null), [request, card]);
  const quote = useQuoteTicket();
  const { reset } = quote;
  // A check answers for the ticket and the version it was asked about, not for later ones.
  useEffect(() => reset(), [savedVersion, reset]);
  const checkIsCurrent = quote.variables !== undefined && JSON.stringify(quote.variables) === JSON.stringify(request);
  const expected = useMemo(
    () => (quote.variables ? previewQuote(quote.variables, savedCard).price : null),
    [quote.variables, savedCard],
  );

  const update = (edit: Partial<QuoteSettings>) => setSettings((current) => ({ ...current, ...edit }));
  const changeLine = (line: QuoteLineDraft) =>
    update({ lines: settings.lines.map((other) => (other.key === line.key ? line : other)) });

  return (
    <Card withBorder radius="lg" padding="lg" component="section" aria-labelledby="quote-title">
      <Group gap="xs">
        <IconCalculator size={22} aria-hidden="true" />
        <Title order={2} fz="h3" id="quote-title">
          Quote
        </Title>
      </Group>
      <Text size="sm" c="dimmed" mb="md">
        Price a ticket with the same rules the server uses
        {cardChanged ? ', from the card as it stands in the form (not saved yet).' : '.'}
      </Text>

      <Stack gap="sm">
        <Stack component="ol" gap="sm" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Shears on the quote">
          {settings.lines.map((line, index) => (
            <QuoteLineEditor
              key={line.key}
              line={line}
              number={index + 1}
              onChange={changeLine}
              onRemove={() => update({ lines: settings.lines.filter((other) => other.key !== line.key) })}
            />
          ))}
        </Stack>
        <Group>
          <Button
            variant="light"
            leftSection={<IconPlus size={18} aria-hidden="true" />}
            onClick={() => update({ lines: [...settings.lines, newQuoteLine()] })}
            disabled={settings.lines.length >= TICKET_LINES_MAX}
          >
            Add a shear
          </Button>
        </Group>
        <Group gap="md" align="flex-start" grow>
          <NumberInput
            label="Tax rate (%)"
            description="The stop's rate."
            min={0}
            max={TAX_RATE_MAX_BP / 100}
            decimalScale={2}
            clampBehavior="none"
            value={settings.taxPercent}
            onChange={(taxPercent) => update({ taxPercent })}
          />
          <Switch
            label="Charge the trip"
            description="This ticket carries the visit's trip charge."
            checked={settings.chargeTrip}
            onChange={(event) => update({ chargeTrip: event.currentTarget.checked })}
            size="md"
            mt="lg"
          />
        </Group>
      </Stack>

      <Divider my="md" />
      <Title order={3} fz="h4" mb="xs">
        Preview
      </Title>
      {!card ? (
        <Alert color="brass" title="No preview yet">
          Fix the marked fields of the rate card to see a preview.
        </Alert>
      ) : settings.lines.length === 0 ? (
        <Text size="sm" c="dimmed">
          Add a shear to price a ticket.
        </Text>
      ) : preview?.problem ? (
        <Alert color="red" title="This ticket cannot be priced">
          {preview.problem}
        </Alert>
      ) : preview?.price ? (
        <QuotePreview price={preview.price} />
      ) : null}

      <Stack gap="sm" mt="md">
        <Group>
          <Button
            variant="outline"
            onClick={() => quote.mutate(request)}
            loading={quote.isPending}
            disabled={settings.lines.length === 0 || !preview?.price}
          >
            Check with the server
          </Button>
        </Group>
        {checkIsCurrent && !quote.isPending ? (
          <ServerCheck
            expected={expected}
            answer={quote.data}
            error={quote.error}
            savedVersion={savedVersion}
            cardChanged={cardChanged}
          />
        ) : null}
      </Stack>
    </Card>
  );
}
