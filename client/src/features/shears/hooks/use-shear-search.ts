import {
  EDGE_TYPES,
  SHEAR_STATUSES,
  TOOL_KINDS,
  type EdgeType,
  type ShearStatus,
  type ToolKind,
} from '@keenroute/shared';
import { useCallback } from 'react';
import { nextSort, oneOf, positiveInt, useListSearch } from '@/features/customers/hooks/use-list-search';
import { PAGE_SIZES } from '@/features/customers/types';
import { SHEAR_SORTS, type ShearListParams, type ShearSort, type SortOrder } from '../types';

/** The Shears list as the URL says it; an empty filter means any. */
export interface ShearSearch {
  page: number;
  pageSize: number;
  q: string;
  edgeType: EdgeType | '';
  toolKind: ToolKind | '';
  status: ShearStatus | '';
  sort: ShearSort;
  order: SortOrder;
}

const DEFAULTS: ShearSearch = {
  page: 1,
  pageSize: 25,
  q: '',
  edgeType: '',
  toolKind: '',
  status: '',
  sort: 'tagCode',
  order: 'asc',
};

export function parseShearSearch(search: URLSearchParams): ShearSearch {
  const pageSize = positiveInt(search.get('pageSize'), DEFAULTS.pageSize);
  return {
    page: positiveInt(search.get('page'), DEFAULTS.page),
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULTS.pageSize,
    q: search.get('q')?.trim() ?? '',
    edgeType: oneOf<EdgeType | ''>(EDGE_TYPES, search.get('edgeType'), ''),
    toolKind: oneOf<ToolKind | ''>(TOOL_KINDS, search.get('toolKind'), ''),
    status: oneOf<ShearStatus | ''>(SHEAR_STATUSES, search.get('status'), ''),
    sort: oneOf(SHEAR_SORTS, search.get('sort'), DEFAULTS.sort),
    order: search.get('order') === 'desc' ? 'desc' : 'asc',
  };
}

export function toShearQuery(search: ShearSearch): ShearListParams {
  return {
    page: search.page,
    pageSize: search.pageSize,
    q: search.q || undefined,
    edgeType: search.edgeType || undefined,
    toolKind: search.toolKind || undefined,
    status: search.status || undefined,
    sort: search.sort,
    order: search.order,
  };
}

export function useShearSearch() {
  const { params, update } = useListSearch(parseShearSearch, DEFAULTS);
  const sortBy = useCallback((sort: ShearSort) => update(nextSort(params, sort)), [params, update]);
  return { params, update, sortBy };
}
