import { ActionIcon, Button, Group, NumberInput, Stack, Text } from '@mantine/core';
import { DISCOUNT_MAX_BP, DISCOUNT_TIERS_MAX, TICKET_LINES_MAX } from '@keenroute/shared';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { newTierKey } from '../rate-card-draft';
import type { RateCardForm } from '../use-rate-card-form';

interface DiscountTiersProps {
  rateCard: RateCardForm;
  readOnly: boolean;
}

/** From so many pairs on one ticket, so much off the shear lines; the highest tier reached applies. */
export function DiscountTiers({ rateCard, readOnly }: DiscountTiersProps) {
  const { form, errorOf } = rateCard;
  const tiers = form.values.multiPairDiscounts;
  const listError = errorOf('multiPairDiscounts');

  const addTier = () => {
    const last = Number(tiers.at(-1)?.minPairs);
    const minPairs = Number.isFinite(last) ? Math.min(TICKET_LINES_MAX, last + 5) : 5;
    form.insertListItem('multiPairDiscounts', { key: newTierKey(), minPairs, discountPercent: 0 });
  };

  return (
    <Stack gap="sm">
      {tiers.length === 0 ? (
        <Text size="sm" c="dimmed">
          No multi-pair discount.
        </Text>
      ) : null}
      {tiers.map((tier, index) => (
        <Group key={tier.key} gap="sm" align="flex-start" wrap="nowrap">
          <NumberInput
            label="From (pairs)"
            min={2}
            max={TICKET_LINES_MAX}
            allowDecimal={false}
            clampBehavior="none"
            readOnly={readOnly}
            style={{ flex: 1 }}
            {...form.getInputProps(`multiPairDiscounts.${index}.minPairs`)}
            error={errorOf(`multiPairDiscounts.${index}.minPairs`)}
          />
          <NumberInput
            label="Discount (%)"
            min={0}
            max={DISCOUNT_MAX_BP / 100}
            decimalScale={2}
            clampBehavior="none"
            readOnly={readOnly}
            style={{ flex: 1 }}
            {...form.getInputProps(`multiPairDiscounts.${index}.discountPercent`)}
            error={errorOf(`multiPairDiscounts.${index}.discountPercent`)}
          />
          {readOnly ? null : (
            <ActionIcon
              color="red"
              mt={28}
              aria-label={`Remove the tier from ${String(tier.minPairs)} pairs`}
              onClick={() => form.removeListItem('multiPairDiscounts', index)}
            >
              <IconTrash size={20} aria-hidden="true" />
            </ActionIcon>
          )}
        </Group>
      ))}
      {listError ? (
        <Text size="sm" c="red">
          {listError}
        </Text>
      ) : null}
      {readOnly ? null : (
        <Group>
          <Button
            variant="light"
            leftSection={<IconPlus size={18} aria-hidden="true" />}
            onClick={addTier}
            disabled={tiers.length >= DISCOUNT_TIERS_MAX}
          >
            Add a tier
          </Button>
        </Group>
      )}
    </Stack>
  );
}
