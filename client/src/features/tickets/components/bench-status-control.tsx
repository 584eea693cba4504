import { Badge, SegmentedControl } from '@mantine/core';
import { useState } from 'react';
import { BENCH_STATUS_LABELS } from '../labels';
import type { BenchStatus, TicketLine } from '../types';
import { useTicketScreen } from './ticket-context';

const STEPS = ['waiting', 'on-the-bench', 'ready'] as const satisfies readonly BenchStatus[];

/** Waiting → on the bench → ready, big enough for a thumb; "handed back" comes with handing the ticket back. */
export function BenchStatusControl({ line, label }: { line: TicketLine; label: string }) {
  const { saver, editable } = useTicketScreen();
  // Shows the tap at once; the server's answer (or a failure) replaces it.
  const [pending, setPending] = useState<BenchStatus | null>(null);

  if (line.benchStatus === 'handed-back') {
    return (
      <Badge size="xl" color="gray" variant="light" radius="sm">
        {BENCH_STATUS_LABELS['handed-back']}
      </Badge>
    );
  }
  return (
    <SegmentedControl
      aria-label={label}
      fullWidth
      size="md"
      radius="md"
      color={(pending ?? line.benchStatus) === 'ready' ? 'keenTeal' : 'brass'}
      disabled={!editable}
      value={pending ?? line.benchStatus}
      data={STEPS.map((value) => ({ value, label: BENCH_STATUS_LABELS[value] }))}
      styles={{ label: { minHeight: 44, display: 'flex', alignItems: 'center', justifyContent: 'center' } }}
      onChange={(benchStatus) => {
        setPending(benchStatus);
        void saver
          .save({ kind: 'change-line', lineId: line.id, changes: { benchStatus } })
          .finally(() => setPending(null));
      }}
    />
  );
}
