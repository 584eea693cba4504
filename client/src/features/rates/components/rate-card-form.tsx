import { Alert, Button, Card, Group, Stack, Switch, Text, TextInput, Title } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { TAX_RULES_NOTE } from '@keenroute/shared';
import { IconDeviceFloppy } from '@tabler/icons-react';
import { useState, type FormEvent, type ReactNode } from 'react';
import { ApiError } from '@/lib/api-error';
import { useSaveRates } from '../api/save-rates';
import { draftErrors, serverProblems } from '../rate-card-draft';
import type { RateCardForm as RateCardFormState } from '../use-rate-card-form';
import { BasePriceGrid } from './base-price-grid';
import { AddOnFields, ChargeFields } from './charge-fields';
import { DiscountTiers } from './discount-tiers';

function Section({ title, description, children }: { title: string; description?: string; children: ReactNode }) {
  return (
    <Card withBorder radius="lg" padding="lg" component="section">
      <Title order={2} fz="h4">
        {title}
      </Title>
      {description ? (
        <Text size="sm" c="dimmed" mb="sm">
          {description}
        </Text>
      ) : null}
      <div style={{ marginTop: description ? 0 : 'var(--mantine-spacing-sm)' }}>{children}</div>
    </Card>
  );
}

interface RateCardFormProps {
  rateCard: RateCardFormState;
  readOnly: boolean;
}

export function RateCardForm({ rateCard, readOnly }: RateCardFormProps) {
  const { form, draftCard, problems, valid, errorOf, startFrom } = rateCard;
  const save = useSaveRates();
  const [refusal, setRefusal] = useState<string | null>(null);
  const [triedInvalid, setTriedInvalid] = useState(false);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setRefusal(null);
    if (!valid) {
      setTriedInvalid(true);
      return;
    }
    setTriedInvalid(false);
    save.mutate(draftCard, {
      onSuccess: (saved) => {
        startFrom(saved.card);
        notifications.show({
          color: 'keenTeal',
          title: `Rates saved as version ${saved.version}`,
          message: 'New tickets are priced from it; tickets already written keep their prices.',
        });
      },
      onError: (error) => {
        if (!(error instanceof ApiError) || !error.hasFieldErrors) return;
        form.setErrors(draftErrors(serverProblems(error.fields), form.values.currency));
        setRefusal(error.message);
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Rate card">
      <Stack gap="md">
        <TextInput
          label="Card name"
          readOnly={readOnly}
          {...form.getInputProps('name')}
          error={errorOf('name')}
          description={`Amounts in ${form.values.currency}; Keenroute stores them in cents.`}
        />

        <Section title="Price per pair" description="Sharpening one pair, by edge type and tool kind.">
          <BasePriceGrid rateCard={rateCard} readOnly={readOnly} />
        </Section>

        <Section title="Charges">
          <ChargeFields rateCard={rateCard} readOnly={readOnly} />
        </Section>

        <Section title="Add-on services" description="Added to a shear's line when the service is done.">
          <AddOnFields rateCard={rateCard} readOnly={readOnly} />
        </Section>

        <Section
          title="Multi-pair discounts"
          description="Taken off the shear lines of one ticket; the highest tier reached applies."
        >
          <DiscountTiers rateCard={rateCard} readOnly={readOnly} />
        </Section>

        <Section title="Tax">
          <Switch
            label="Sharpening services are taxable"
            size="md"
            disabled={readOnly}
            {...form.getInputProps('servicesTaxable', { type: 'checkbox' })}
          />
          <Text size="sm" c="dimmed" mt="xs">
            {TAX_RULES_NOTE} The rate itself is set per stop.
          </Text>
        </Section>

        {refusal ? (
          <Alert color="red" title="The server did not save the card">
            {refusal} The fields it refused are marked.
          </Alert>
        ) : null}
        {triedInvalid && !valid ? (
          <Alert color="red" title="Fix the marked fields first">
            {problems.length === 1 ? 'One field needs' : `${problems.length} fields need`} a change before the card can
            be saved.
          </Alert>
        ) : null}

        {readOnly ? (
          <Text size="sm" c="dimmed">
            Only the owner changes the rates.
          </Text>
        ) : (
          <Group justify="flex-end" gap="sm">
            <Button
              variant="default"
              disabled={!form.isDirty() || save.isPending}
              onClick={() => {
                form.reset();
                setRefusal(null);
                setTriedInvalid(false);
              }}
            >
              Undo changes
            </Button>
            <Button
              type="submit"
              loading={save.isPending}
              leftSection={<IconDeviceFloppy size={18} aria-hidden="true" />}
            >
              Save rates
            </Button>
          </Group>
        )}
      </Stack>
    </form>
  );
}
