import { SegmentedControl } from '@mantine/core';
import { IMPORT_HELP } from '../columns';
import { IMPORT_KINDS, type ImportKind } from '../types';

const data = IMPORT_KINDS.map((kind) => ({ value: kind, label: IMPORT_HELP[kind].label }));

export function KindPicker({ value, onChange }: { value: ImportKind; onChange: (kind: ImportKind) => void }) {
  return (
    <SegmentedControl
      aria-label="What the file holds"
      fullWidth
      size="md"
      data={data}
      value={value}
      onChange={onChange}
    />
  );
}
