import { DonutChart } from '@mantine/charts';
import { ColorSwatch, Group, SimpleGrid, Stack } from '@mantine/core';
import { EDGE_TYPE_LABELS, TOOL_KIND_LABELS, isEdgeType, isToolKind } from '@keenroute/shared';
import { upperFirst } from '@/lib/format';
import { useEdgeTypesReport } from '../api/get-edge-types-report';
import { useToolKindsReport } from '../api/get-tool-kinds-report';
import { count, money, moneyOrDash, share } from '../format';
import type { LineShare, ReportName, ReportParams } from '../types';
import { CsvButton } from './csv-button';
import { ReportSection } from './report-section';
import { ReportStates } from './report-states';
import { ReportTable, type ReportColumn } from './report-table';
import { sumsOf, totalCell } from '../totals';

// Not the share: its rounded parts need not add up to 100%.
const SHARE_SUMS = ['lines', 'revenueCents'] as const;

const COLORS = ['keenTeal.6', 'brass.6', 'keenTeal.3', 'brass.3', 'gray.6', 'keenTeal.8', 'brass.8'];

interface ShareRow extends LineShare {
  label: string;
  color: string;
}

function shareColumns(kindLabel: string): ReportColumn<ShareRow, Partial<LineShare>>[] {
  return [
    {
      key: 'label',
      label: kindLabel,
      sortValue: (row) => row.label,
      minWidth: 150,
      cell: (row) => (
        <Group gap="xs" wrap="nowrap">
          <ColorSwatch color={`var(--mantine-color-${row.color.replace('.', '-')})`} size={12} withShadow={false} />
          {row.label}
        </Group>
      ),
    },
    {
      key: 'lines',
      label: 'Shears',
      numeric: true,
      sortValue: (r) => r.lines,
      cell: (r) => count(r.lines),
      total: (t) => totalCell(t.lines, count),
    },
    {
      key: 'revenue',
      label: 'Revenue',
      numeric: true,
      sortValue: (r) => r.revenueCents,
      cell: (r) => money(r.revenueCents),
      total: (t) => totalCell(t.revenueCents, money),
    },
    {
      key: 'average',
      label: 'Average',
      numeric: true,
      sortValue: (r) => r.averageCents,
      cell: (r) => moneyOrDash(r.averageCents),
      total: (t) => totalCell(t.averageCents, moneyOrDash),
    },
    {
      key: 'share',
      label: 'Share',
      numeric: true,
      sortValue: (r) => r.shareBp,
      cell: (r) => share(r.shareBp),
      total: (t) => totalCell(t.shareBp, share),
    },
  ];
}

interface ShareBlockProps {
  title: string;
  kindLabel: string;
  name: ReportName;
  params: ReportParams;
  rows: ShareRow[];
  totals?: Partial<LineShare>;
}

function ShareBlock({ title, kindLabel, name, params, rows, totals }: ShareBlockProps) {
  return (
    <ReportSection title={title} actions={<CsvButton name={name} params={params} label={title} />}>
      <Stack gap="md" align="stretch">
        <DonutChart
          data={rows.map((row) => ({ name: row.label, value: row.revenueCents / 100, color: row.color }))}
          valueFormatter={(value) => money(Math.round(value * 100))}
          chartLabel={totals?.revenueCents === undefined ? undefined : money(totals.revenueCents)}
          size={180}
          thickness={28}
          tooltipDataSource="segment"
          mx="auto"
          aria-label={title}
        />
        <ReportTable
          label={title}
          columns={shareColumns(kindLabel)}
          rows={rows}
          rowKey={(row) => row.label}
          totals={totals}
          minWidth={460}
        />
      </Stack>
    </ReportSection>
  );
}

function withColors<T extends LineShare>(rows: T[], label: (row: T) => string): ShareRow[] {
  return rows.map((row, index) => ({ ...row, label: label(row), color: COLORS[index % COLORS.length]! }));
}

export const edgeTypeLabel = (value: string) => (isEdgeType(value) ? upperFirst(EDGE_TYPE_LABELS[value]) : value);
export const toolKindLabel = (value: string) => (isToolKind(value) ? upperFirst(TOOL_KIND_LABELS[value]) : value);

/** Which edge types and tool kinds the revenue comes from: shear lines only, at the price charged. */
export function LineShareSection({ params }: { params: ReportParams }) {
  const edgeTypes = useEdgeTypesReport(params);
  const toolKinds = useToolKindsReport(params);
  return (
    <SimpleGrid cols={{ base: 1, xl: 2 }} spacing="md">
      <ReportStates
        query={edgeTypes}
        what="the revenue by edge type"
        isEmpty={(data) => data.rows.length === 0}
        emptyTitle="No shears were sharpened in these dates."
      >
        {(data) => (
          <ShareBlock
            title="By edge type"
            kindLabel="Edge type"
            name="edge-types"
            params={params}
            rows={withColors(data.rows, (row) => edgeTypeLabel(row.edgeType))}
            totals={data.totals ?? sumsOf(data.rows, SHARE_SUMS)}
          />
        )}
      </ReportStates>
      <ReportStates
        query={toolKinds}
        what="the revenue by tool kind"
        isEmpty={(data) => data.rows.length === 0}
        emptyTitle="No shears were sharpened in these dates."
      >
        {(data) => (
          <ShareBlock
            title="By tool kind"
            kindLabel="Tool kind"
            name="tool-kinds"
            params={params}
            rows={withColors(data.rows, (row) => toolKindLabel(row.toolKind))}
            totals={data.totals ?? sumsOf(data.rows, SHARE_SUMS)}
          />
        )}
      </ReportStates>
    </SimpleGrid>
  );
}
