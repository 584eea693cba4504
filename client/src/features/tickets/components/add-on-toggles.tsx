import { Button, Collapse, Stack, Switch } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconChevronDown, IconChevronUp } from '@tabler/icons-react';
import { ADD_ON_CODES, ADD_ON_LABELS, type AddOnCode } from '@keenroute/shared';
import { upperFirst } from '@/lib/format';
import type { TicketLine } from '../types';
import { useTicketScreen } from './ticket-context';

/** "Add-ons: blade polish" or "No add-ons": what the folded row says, so nothing chosen is hidden. */
export function addOnsWords(addOns: readonly AddOnCode[]): string {
  return addOns.length === 0 ? 'No add-ons' : `Add-ons: ${addOns.map((code) => ADD_ON_LABELS[code]).join(', ')}`;
}

/** The add-on services from the rates, one switch each, folded away until wanted; the server prices them. */
export function AddOnToggles({ line }: { line: TicketLine }) {
  const { saver, editable } = useTicketScreen();
  const [opened, fold] = useDisclosure(false);
  const contentId = `add-ons-${line.id}`;
  const toggle = (code: AddOnCode, on: boolean) => {
    // Kept in the rates' order, so the same choice always reads the same.
    const addOns = on
      ? ADD_ON_CODES.filter((c) => c === code || line.addOns.includes(c))
      : line.addOns.filter((c) => c !== code);
    void saver.save({ kind: 'change-line', lineId: line.id, changes: { addOns } });
  };
  return (
    <Stack gap={0}>
      <Button
        variant="subtle"
        color="dark"
        size="md"
        mih={44}
        justify="space-between"
        fullWidth
        rightSection={opened ? <IconChevronUp size={18} /> : <IconChevronDown size={18} />}
        aria-expanded={opened}
        aria-controls={contentId}
        onClick={fold.toggle}
        styles={{ label: { whiteSpace: 'normal', textAlign: 'left' } }}
      >
        {addOnsWords(line.addOns)}
      </Button>
      <Collapse expanded={opened} id={contentId}>
        <Stack gap={0} role="group" aria-label={`Add-ons for ${line.shear.tagCode}`}>
          {ADD_ON_CODES.map((code) => (
            <Switch
              key={code}
              size="md"
              label={upperFirst(ADD_ON_LABELS[code])}
              checked={line.addOns.includes(code)}
              disabled={!editable}
              onChange={(event) => toggle(code, event.currentTarget.checked)}
              styles={{
                body: { minHeight: 44, alignItems: 'center' },
                label: { fontSize: 'var(--mantine-font-size-md)' },
              }}
            />
          ))}
        </Stack>
      </Collapse>
    </Stack>
  );
}
