import { Skeleton, Stack, Text } from '@mantine/core';
import { IconChartBar } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { ListEmpty, ListLoadFailed } from '@/components/list-states';

/** The shape of a chart and a table while the figures load. */
export function ReportLoading({ label, chart = true }: { label: string; chart?: boolean }) {
  return (
    <Stack gap="sm" role="status" aria-label={label}>
      {chart ? <Skeleton height={260} radius="lg" /> : null}
      {Array.from({ length: 6 }, (_, index) => (
        <Skeleton key={index} height={36} radius="sm" />
      ))}
    </Stack>
  );
}

export function ReportFailed({ title, error, onRetry }: { title: string; error: Error; onRetry: () => void }) {
  return <ListLoadFailed title={title} message={error.message} onRetry={onRetry} />;
}

export function ReportEmpty({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <ListEmpty
      icon={<IconChartBar size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
      title={title}
    >
      {children}
    </ListEmpty>
  );
}

interface ReportQueryLike<T> {
  data: T | undefined;
  isPending: boolean;
  isError: boolean;
  error: Error | null;
  refetch: () => unknown;
}

interface ReportStatesProps<T> {
  query: ReportQueryLike<T>;
  /** What is loading, in words: "the revenue per stop". */
  what: string;
  isEmpty: (data: T) => boolean;
  emptyTitle: string;
  emptyHint?: ReactNode;
  chart?: boolean;
  children: (data: T) => ReactNode;
}

/** Loading, failed, empty, or the report: every report page shows the same four states the same way. */
export function ReportStates<T>({
  query,
  what,
  isEmpty,
  emptyTitle,
  emptyHint,
  chart,
  children,
}: ReportStatesProps<T>) {
  if (query.isPending) return <ReportLoading label={`Loading ${what}`} chart={chart} />;
  if (query.isError || !query.data) {
    return (
      <ReportFailed
        title={`${what.charAt(0).toUpperCase()}${what.slice(1)} could not be loaded`}
        error={query.error ?? new Error('No answer came back.')}
        onRetry={() => void query.refetch()}
      />
    );
  }
  if (isEmpty(query.data)) {
    return (
      <ReportEmpty title={emptyTitle}>
        {emptyHint ?? (
          <Text size="sm" c="dimmed" maw={440}>
            Try a longer range of dates, or every sharpener.
          </Text>
        )}
      </ReportEmpty>
    );
  }
  return <>{children(query.data)}</>;
}
