import { useQuery } from '@tanstack/react-query';
import type { DriveCostReport, ReportParams } from '../types';
import { reportQueryOptions } from './get-report';

/** GET /api/reports/drive-cost: the stops that pay least for the drive, with what would help. */
export function getDriveCostReportQueryOptions(params: ReportParams) {
  return reportQueryOptions<DriveCostReport>('drive-cost', params);
}

export function useDriveCostReport(params: ReportParams) {
  return useQuery(getDriveCostReportQueryOptions(params));
}
