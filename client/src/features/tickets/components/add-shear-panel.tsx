import { Button, Card, Group, Stack, Text, TextInput, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconPlus, IconQrcode } from '@tabler/icons-react';
import { normalizeTagCode } from '@keenroute/shared';
import { useState, type FormEvent } from 'react';
import { expectedWords } from '../labels';
import { NewShearModal } from './new-shear-modal';
import { TagScanner } from './tag-scanner';
import { useTicketScreen } from './ticket-context';

/** Adds a pair to the ticket: its tag code typed or scanned, or a pair with no tag yet registered on the spot. */
export function AddShearPanel() {
  const { ticket, saver } = useTicketScreen();
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [adding, setAdding] = useState(false);
  const [scanning, scanner] = useDisclosure(false);
  const [newOpened, newShear] = useDisclosure(false);

  const addByTag = async (tagCode: string) => {
    setAdding(true);
    const outcome = await saver.save({ kind: 'add-line', input: { tagCode } }, { showError: false });
    setAdding(false);
    if (outcome.ok) {
      setText('');
      setError(null);
    } else {
      setText(tagCode);
      setError(outcome.error.message);
    }
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const tagCode = normalizeTagCode(text);
    if (!tagCode) {
      setError('A tag code looks like KR-000123 (the digits alone will do).');
      return;
    }
    void addByTag(tagCode);
  };

  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="add-shear-title">
      <Stack gap="sm">
        <Title order={2} fz="h3" id="add-shear-title">
          Add a shear
        </Title>
        {ticket.expected.length > 0 ? (
          <Text fw={600} c="brass.8">
            Still to add: {expectedWords(ticket.expected)}
          </Text>
        ) : null}
        <form onSubmit={submit} noValidate>
          <Stack gap="sm">
            <TextInput
              label="Tag code"
              placeholder="KR-000123"
              size="lg"
              styles={{ input: { fontFamily: 'var(--mantine-font-family-monospace)' } }}
              autoComplete="off"
              autoCapitalize="characters"
              spellCheck={false}
              value={text}
              error={error}
              onChange={(event) => {
                setText(event.currentTarget.value);
                setError(null);
              }}
            />
            <Group grow gap="sm">
              <Button type="submit" size="lg" leftSection={<IconPlus size={20} />} loading={adding}>
                Add
              </Button>
              <Button
                variant="light"
                size="lg"
                leftSection={<IconQrcode size={20} />}
                onClick={scanning ? scanner.close : scanner.open}
                aria-pressed={scanning}
              >
                Scan
              </Button>
            </Group>
          </Stack>
        </form>
        {scanning ? (
          <TagScanner
            onClose={scanner.close}
            onCode={(tagCode) => {
              scanner.close();
              void addByTag(tagCode);
            }}
          />
        ) : null}
        <Button variant="default" size="lg" onClick={newShear.open}>
          New shear (no tag yet)
        </Button>
      </Stack>
      <NewShearModal opened={newOpened} onClose={newShear.close} />
    </Card>
  );
}
