import { Group, Radio, Stack, Text } from '@mantine/core';
import type { GeocodeCandidate } from '../../types';

interface CandidatePickerProps {
  label: string;
  candidates: GeocodeCandidate[];
  picked: GeocodeCandidate | null;
  onPick: (candidate: GeocodeCandidate) => void;
}

const same = (a: GeocodeCandidate, b: GeocodeCandidate | null) =>
  b !== null && a.latitude === b.latitude && a.longitude === b.longitude && a.label === b.label;

/** The geocoder's places for an address, one large card each, to pick the right one. */
export function CandidatePicker({ label, candidates, picked, onPick }: CandidatePickerProps) {
  const index = candidates.findIndex((candidate) => same(candidate, picked));
  return (
    <Radio.Group
      label={label}
      value={index >= 0 ? String(index) : null}
      onChange={(value) => {
        const candidate = candidates[Number(value)];
        if (candidate) onPick(candidate);
      }}
    >
      <Stack gap="xs" mt="xs">
        {candidates.map((candidate, position) => (
          <Radio.Card key={`${candidate.label}-${position}`} value={String(position)} radius="md" p="sm">
            <Group wrap="nowrap" align="flex-start" gap="sm">
              <Radio.Indicator mt={2} />
              <div>
                <Text fw={600} size="sm">
                  {candidate.label}
                </Text>
                <Text size="xs" c="dimmed">
                  {candidate.latitude.toFixed(5)}, {candidate.longitude.toFixed(5)}
                </Text>
              </div>
            </Group>
          </Radio.Card>
        ))}
      </Stack>
    </Radio.Group>
  );
}
