import { oneOf, positiveInt, useListSearch } from '@/features/customers/hooks/use-list-search';
import { AUDIT_ACTIONS, type AuditAction, type AuditListParams } from '../types';

export const AUDIT_PAGE_SIZE = 50;

const ACTION_FILTERS = ['all', ...AUDIT_ACTIONS] as const;
const CALENDAR_DAY = /^\d{4}-\d{2}-\d{2}$/;

export interface AuditSearch {
  action: AuditAction | 'all';
  /** Part of the e-mail of who did it (for a failed sign-in, the e-mail typed). */
  actor: string;
  from: string;
  to: string;
  page: number;
}

const DEFAULTS: AuditSearch = { action: 'all', actor: '', from: '', to: '', page: 1 };

const day = (value: string | null) => (value && CALENDAR_DAY.test(value) ? value : '');

function parse(search: URLSearchParams): AuditSearch {
  return {
    action: oneOf(ACTION_FILTERS, search.get('action'), 'all'),
    actor: search.get('actor') ?? '',
    from: day(search.get('from')),
    to: day(search.get('to')),
    page: positiveInt(search.get('page'), 1),
  };
}

/** The log's filters and page live in the URL, so a link or a reload shows the same entries. */
export function useAuditSearch() {
  return useListSearch(parse, DEFAULTS);
}

export function toAuditQuery(search: AuditSearch): AuditListParams {
  const query: AuditListParams = { page: search.page, pageSize: AUDIT_PAGE_SIZE };
  if (search.action !== 'all') query.action = search.action;
  if (search.actor) query.actor = search.actor;
  if (search.from) query.from = search.from;
  if (search.to) query.to = search.to;
  return query;
}

export const isFiltered = (search: AuditSearch) =>
  search.action !== 'all' || Boolean(search.actor || search.from || search.to);
