import { useQuery } from '@tanstack/react-query';
import type { EdgeTypesReport, ReportParams } from '../types';
import { reportQueryOptions } from './get-report';

/** GET /api/reports/edge-types: shear lines and their revenue by edge type. */
export function getEdgeTypesReportQueryOptions(params: ReportParams) {
  return reportQueryOptions<EdgeTypesReport>('edge-types', params);
}

export function useEdgeTypesReport(params: ReportParams) {
  return useQuery(getEdgeTypesReportQueryOptions(params));
}
