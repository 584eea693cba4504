import { useMutation } from '@tanstack/react-query';
import { showPdf } from '@/features/shears/api/print-labels';
import { api } from '@/lib/api-client';
import type { DayRange } from '../date-range';

/** Whose statement: a customer billed for themselves, or a stop that pays for its people. */
export interface StatementSubject {
  kind: 'customer' | 'stop';
  id: string;
  name: string;
}

const STATEMENT_ROUTES: Readonly<Record<StatementSubject['kind'], string>> = {
  customer: 'customers',
  stop: 'stops',
};

export function getStatementPdf(subject: Pick<StatementSubject, 'kind' | 'id'>, range: DayRange): Promise<Blob> {
  return api.blob(`/statements/${STATEMENT_ROUTES[subject.kind]}/${encodeURIComponent(subject.id)}`, {
    query: { from: range.from, to: range.to },
  });
}

/** statement-pine-street-salon-2026-01-01-to-2026-03-31.pdf: who and which period, when it lands in Downloads. */
export function statementFileName(subject: Pick<StatementSubject, 'name'>, range: DayRange): string {
  const who = subject.name.replace(/\W+/g, '-').replace(/^-|-$/g, '').toLowerCase() || 'account';
  return `statement-${who}-${range.from}-to-${range.to}.pdf`;
}

/** The PDF needs the auth header, so it comes as a blob; it opens in a new tab (or downloads where that is blocked). */
export function useStatementPdf() {
  return useMutation({
    mutationFn: async ({ subject, range }: { subject: StatementSubject; range: DayRange }) => {
      showPdf(await getStatementPdf(subject, range), statementFileName(subject, range));
    },
  });
}
