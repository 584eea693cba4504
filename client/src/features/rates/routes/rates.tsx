import { Alert, Button, Grid, Stack } from '@mantine/core';
import { useMemo } from 'react';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { useSignedInUser } from '@/lib/session';
import { canEditRates, canSeeRateHistory } from '../access';
import { useRates } from '../api/get-rates';
import { QuotePanel } from '../components/quote-panel';
import { RateCardForm } from '../components/rate-card-form';
import { RateHistory } from '../components/rate-history';
import { VersionStatus } from '../components/version-status';
import { cardToDraft, draftToCard } from '../rate-card-draft';
import type { RateCardVersion } from '../types';
import { useRateCardForm } from '../use-rate-card-form';

function RatesWorkspace({
  current,
  readOnly,
  withHistory,
}: {
  current: RateCardVersion;
  readOnly: boolean;
  withHistory: boolean;
}) {
  const rateCard = useRateCardForm(current.card);
  // Both sides through the same conversion, so key order and rounding cannot make a difference.
  const saved = useMemo(() => JSON.stringify(draftToCard(cardToDraft(current.card))), [current.card]);
  const cardChanged = JSON.stringify(rateCard.draftCard) !== saved;

  return (
    <Grid gap="lg">
      <Grid.Col span={{ base: 12, lg: 7 }}>
        <Stack gap="md">
          <VersionStatus current={current} />
          <RateCardForm rateCard={rateCard} readOnly={readOnly} />
        </Stack>
      </Grid.Col>
      <Grid.Col span={{ base: 12, lg: 5 }}>
        <Stack gap="md">
          <QuotePanel
            card={rateCard.valid ? rateCard.draftCard : null}
            savedCard={current.card}
            savedVersion={current.version}
            cardChanged={cardChanged}
          />
          {withHistory ? <RateHistory /> : null}
        </Stack>
      </Grid.Col>
    </Grid>
  );
}

export function RatesRoute() {
  const user = useSignedInUser();
  const rates = useRates();
  const readOnly = !canEditRates(user.role);

  return (
    <Stack gap="md" maw={1400}>
      <PageHeader
        title="Rates"
        description={
          readOnly
            ? 'The price list every ticket is priced from. Only the owner changes it; you can read it and price a quote.'
            : 'The price list every ticket is priced from. A change saves a new version; tickets already written keep their prices.'
        }
      />
      {rates.isPending ? (
        <PageLoader label="Loading the rates" />
      ) : rates.isError ? (
        <Alert color="red" title="The rates could not be loaded">
          {rates.error.message}{' '}
          <Button variant="subtle" size="xs" onClick={() => void rates.refetch()}>
            Try again
          </Button>
        </Alert>
      ) : (
        <RatesWorkspace current={rates.data} readOnly={readOnly} withHistory={canSeeRateHistory(user.role)} />
      )}
    </Stack>
  );
}
