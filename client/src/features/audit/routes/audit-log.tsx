import { Alert, Button, Stack } from '@mantine/core';
import { IconShieldCheck } from '@tabler/icons-react';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { PageHeader } from '@/components/page-header';
import { ListFooter } from '@/features/customers/components/list-footer';
import { rangeProblem } from '@/features/invoices/date-range';
import { useAuditLog } from '../api/get-audit-log';
import { AuditFilters } from '../components/audit-filters';
import { AuditTable } from '../components/audit-table';
import { AUDIT_PAGE_SIZE, isFiltered, toAuditQuery, useAuditSearch } from '../hooks/use-audit-search';

/** The owner's record of sign-ins, role changes, prices set by hand, voids, credit notes and payments, newest first. */
export function AuditLogRoute() {
  const { params, update } = useAuditSearch();
  // One end alone is an open range; both ends must be in order.
  const problem = params.from && params.to ? rangeProblem(params.from, params.to) : null;
  const log = useAuditLog(toAuditQuery(params), { enabled: problem === null });
  const entries = log.data?.items ?? [];
  const filtered = isFiltered(params);

  return (
    <Stack gap="md" maw={1280}>
      <PageHeader
        title="Audit log"
        description="Who signed in, changed a role or a price, voided or credited an invoice, and took money. Entries cannot be changed."
      />

      <AuditFilters params={params} update={update} />

      {problem ? (
        <Alert color="red" role="alert" title="Check the dates">
          {problem}
        </Alert>
      ) : log.isPending ? (
        <ListLoading label="Loading the audit log" />
      ) : log.isError ? (
        <ListLoadFailed
          title="The audit log could not be loaded"
          message={log.error.message}
          onRetry={() => void log.refetch()}
        />
      ) : entries.length === 0 ? (
        <ListEmpty
          icon={<IconShieldCheck size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
          title={filtered ? 'No entry matches these filters.' : 'Nothing recorded yet.'}
        >
          {filtered ? (
            <Button variant="subtle" onClick={() => update({ action: 'all', actor: '', from: '', to: '', page: 1 })}>
              Show every entry
            </Button>
          ) : null}
        </ListEmpty>
      ) : (
        <AuditTable entries={entries} />
      )}

      {problem ? null : (
        <ListFooter
          page={params.page}
          pageSize={log.data?.pageSize ?? AUDIT_PAGE_SIZE}
          total={log.data?.total ?? 0}
          loadingNext={log.isPlaceholderData}
          onPage={(page) => update({ page })}
        />
      )}
    </Stack>
  );
}
