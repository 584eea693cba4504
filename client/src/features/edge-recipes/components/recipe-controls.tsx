import { Group, NumberInput, SegmentedControl, Stack, Switch, Text } from '@mantine/core';
import { LENGTH_MAX_IN, LENGTH_MIN_IN, LENGTH_STEP_IN, isRuleError, validateLength } from '@keenroute/shared';
import { useState, type ReactNode } from 'react';
import type { RecipeSettings } from '../recipe-settings';

interface RecipeControlsProps {
  settings: RecipeSettings;
  onChange: (settings: RecipeSettings) => void;
}

function Labelled({ label, children }: { label: string; children: ReactNode }) {
  return (
    <Stack gap={4}>
      <Text size="sm" fw={500} id={`recipe-control-${label}`}>
        {label}
      </Text>
      {children}
    </Stack>
  );
}

/** The shears the table describes: their length, hand, what they cut, and whether the inside edge needs work. */
export function RecipeControls({ settings, onChange }: RecipeControlsProps) {
  const [lengthText, setLengthText] = useState<string | number>(settings.lengthIn);
  const [lengthError, setLengthError] = useState<string | null>(null);

  const changeLength = (value: string | number) => {
    setLengthText(value);
    try {
      const lengthIn = validateLength(typeof value === 'number' ? value : Number.NaN);
      setLengthError(null);
      onChange({ ...settings, lengthIn });
    } catch (error) {
      if (!isRuleError(error)) throw error;
      // The table keeps the last length that is a real shear's.
      setLengthError(error.message);
    }
  };

  return (
    <Group gap="lg" align="flex-start" wrap="wrap">
      <NumberInput
        label="Length (inches)"
        description={`${LENGTH_MIN_IN} to ${LENGTH_MAX_IN}, in quarter inches`}
        value={lengthText}
        onChange={changeLength}
        min={LENGTH_MIN_IN}
        max={LENGTH_MAX_IN}
        step={LENGTH_STEP_IN}
        decimalScale={2}
        clampBehavior="none"
        error={lengthError}
        w={200}
      />
      <Labelled label="Hand">
        <SegmentedControl
          aria-labelledby="recipe-control-Hand"
          value={settings.handedness}
          onChange={(value) => onChange({ ...settings, handedness: value === 'left' ? 'left' : 'right' })}
          data={[
            { value: 'right', label: 'Right-handed' },
            { value: 'left', label: 'Left-handed' },
          ]}
        />
      </Labelled>
      <Labelled label="Cuts">
        <SegmentedControl
          aria-labelledby="recipe-control-Cuts"
          value={settings.use}
          onChange={(value) => onChange({ ...settings, use: value === 'grooming' ? 'grooming' : 'hair' })}
          data={[
            { value: 'hair', label: 'Hair' },
            { value: 'grooming', label: 'Grooming' },
          ]}
        />
      </Labelled>
      <Switch
        label="Inside-edge work"
        description="Convex and semi-convex shears are then taken apart and the inside edge honed."
        checked={settings.insideEdge}
        onChange={(event) => onChange({ ...settings, insideEdge: event.currentTarget.checked })}
        size="md"
        maw={300}
        mt={{ base: 0, sm: 'lg' }}
      />
    </Group>
  );
}
