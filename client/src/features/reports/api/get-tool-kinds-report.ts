import { useQuery } from '@tanstack/react-query';
import type { ToolKindsReport, ReportParams } from '../types';
import { reportQueryOptions } from './get-report';

/** GET /api/reports/tool-kinds: shear lines and their revenue by tool kind. */
export function getToolKindsReportQueryOptions(params: ReportParams) {
  return reportQueryOptions<ToolKindsReport>('tool-kinds', params);
}

export function useToolKindsReport(params: ReportParams) {
  return useQuery(getToolKindsReportQueryOptions(params));
}
