import { oneOf, positiveInt, useListSearch } from '@/features/customers/hooks/use-list-search';
import { INVOICE_STATUSES, type InvoiceListParams } from '../types';

export const INVOICE_FILTERS = ['all', ...INVOICE_STATUSES, 'overdue'] as const;
export type InvoiceFilter = (typeof INVOICE_FILTERS)[number];

export const INVOICE_PAGE_SIZE = 25;

export interface InvoiceSearch {
  status: InvoiceFilter;
  q: string;
  page: number;
}

const DEFAULTS: InvoiceSearch = { status: 'all', q: '', page: 1 };

function parse(search: URLSearchParams): InvoiceSearch {
  return {
    status: oneOf(INVOICE_FILTERS, search.get('status'), 'all'),
    q: search.get('q') ?? '',
    page: positiveInt(search.get('page'), 1),
  };
}

/** The list's filter chip, search and page live in the URL, so a link or a reload shows the same list. */
export function useInvoiceSearch() {
  return useListSearch(parse, DEFAULTS);
}

/** "Overdue" is worked out on the server from the due date, so it is a flag of its own rather than a status. */
export function toInvoiceQuery(search: InvoiceSearch): InvoiceListParams {
  const query: InvoiceListParams = { page: search.page, pageSize: INVOICE_PAGE_SIZE };
  if (search.status === 'overdue') query.overdue = true;
  else if (search.status !== 'all') query.status = search.status;
  if (search.q) query.q = search.q;
  return query;
}
