import { Badge, Button, Card, Divider, Group, Stack, Text, Textarea } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconTrash } from '@tabler/icons-react';
import { useState } from 'react';
import { TagCode } from '@/features/shears/components/tag-code';
import { canOverridePrice } from '../access';
import { money, shearWords } from '../labels';
import type { TicketLine } from '../types';
import { AddOnToggles } from './add-on-toggles';
import { BenchStatusControl } from './bench-status-control';
import { LinePhotos } from './line-photos';
import { LineRecipe } from './line-recipe';
import { OverrideModal } from './override-modal';
import { useTicketScreen } from './ticket-context';

function LinePrice({ line }: { line: TicketLine }) {
  const { currency } = useTicketScreen();
  const overridden = line.overrideCents !== null;
  return (
    <Stack gap={0} align="flex-end">
      <Text fw={700} size="xl" aria-label={`Price of ${line.shear.tagCode}`}>
        {money(line.effectiveCents, currency)}
      </Text>
      {overridden ? (
        <Text size="sm" c="dimmed">
          <Text span td="line-through">
            {money(line.priceCents, currency)}
          </Text>{' '}
          changed: {line.overrideReason}
        </Text>
      ) : null}
    </Stack>
  );
}

/** One pair on the ticket: what it is, its recipe and cautions, add-ons, price, bench status and notes. */
export function TicketLineCard({ line }: { line: TicketLine }) {
  const { saver, role, editable } = useTicketScreen();
  const [overrideOpened, override] = useDisclosure(false);
  const [notes, setNotes] = useState(line.notes ?? '');
  const headingId = `line-${line.id}`;

  const saveNotes = () => {
    if (notes.trim() === (line.notes ?? '').trim()) return;
    void saver.save({ kind: 'change-line', lineId: line.id, changes: { notes: notes.trim() } });
  };

  return (
    <Card component="li" withBorder radius="lg" padding="md" aria-labelledby={headingId}>
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" wrap="nowrap" gap="sm">
          <Stack gap={2} style={{ minWidth: 0 }}>
            <Text id={headingId} fz="xl">
              <TagCode code={line.shear.tagCode} size="xl" />
            </Text>
            <Text size="md">{shearWords(line.shear)}</Text>
            {line.shear.handedness === 'left' ? (
              <Badge variant="light" color="brass" radius="sm" w="fit-content">
                Left-handed
              </Badge>
            ) : null}
          </Stack>
          <LinePrice line={line} />
        </Group>

        <BenchStatusControl line={line} label={`Bench status of ${line.shear.tagCode}`} />
        <LineRecipe line={line} />
        <Divider />
        <AddOnToggles line={line} />
        <LinePhotos line={line} />
        <Textarea
          label="Notes"
          size="md"
          rows={2}
          value={notes}
          disabled={!editable}
          onChange={(event) => setNotes(event.currentTarget.value)}
          onBlur={saveNotes}
        />
        {editable ? (
          <Group justify="space-between" gap="sm">
            {canOverridePrice(role) ? (
              <Button variant="default" size="md" mih={44} onClick={override.open}>
                Change price
              </Button>
            ) : (
              <span />
            )}
            <Button
              variant="subtle"
              color="red"
              size="md"
              mih={44}
              leftSection={<IconTrash size={18} />}
              onClick={() => void saver.save({ kind: 'remove-line', lineId: line.id })}
            >
              Take off the ticket
            </Button>
          </Group>
        ) : null}
      </Stack>
      {overrideOpened ? <OverrideModal line={line} opened onClose={override.close} /> : null}
    </Card>
  );
}
