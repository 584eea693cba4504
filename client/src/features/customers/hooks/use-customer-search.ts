import { useCallback } from 'react';
import { CUSTOMER_SORTS, PAGE_SIZES, type CustomerListParams, type CustomerSort, type SortOrder } from '../types';
import { nextSort, oneOf, positiveInt, useListSearch } from './use-list-search';

export const CUSTOMER_ACTIVE_FILTERS = ['true', 'false', 'all'] as const;
export type CustomerActiveFilter = (typeof CUSTOMER_ACTIVE_FILTERS)[number];

/** The Customers list as the URL says it: `active` is "true" (the default), "false" or "all". */
export interface CustomerSearch {
  page: number;
  pageSize: number;
  q: string;
  stopId: string;
  active: CustomerActiveFilter;
  sort: CustomerSort;
  order: SortOrder;
}

const DEFAULTS: CustomerSearch = {
  page: 1,
  pageSize: 25,
  q: '',
  stopId: '',
  active: 'true',
  sort: 'name',
  order: 'asc',
};

export function parseCustomerSearch(search: URLSearchParams): CustomerSearch {
  const pageSize = positiveInt(search.get('pageSize'), DEFAULTS.pageSize);
  return {
    page: positiveInt(search.get('page'), DEFAULTS.page),
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULTS.pageSize,
    q: search.get('q')?.trim() ?? '',
    stopId: search.get('stopId') ?? '',
    active: oneOf(CUSTOMER_ACTIVE_FILTERS, search.get('active'), DEFAULTS.active),
    sort: oneOf(CUSTOMER_SORTS, search.get('sort'), DEFAULTS.sort),
    order: search.get('order') === 'desc' ? 'desc' : 'asc',
  };
}

/** What the API is asked for: empty filters are left out. */
export function toCustomerQuery(search: CustomerSearch): CustomerListParams {
  return {
    page: search.page,
    pageSize: search.pageSize,
    q: search.q || undefined,
    stopId: search.stopId || undefined,
    active: search.active === 'all' ? undefined : search.active === 'true',
    sort: search.sort,
    order: search.order,
  };
}

export function useCustomerSearch() {
  const { params, update } = useListSearch(parseCustomerSearch, DEFAULTS);
  const sortBy = useCallback((sort: CustomerSort) => update(nextSort(params, sort)), [params, update]);
  return { params, update, sortBy };
}
