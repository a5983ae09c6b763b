import { issueReportSchema, type IssueReportInput, type ReportRecord } from '@polecourt/contracts';
import { type UseMutationOptions, useMutation, useQueryClient } from '@tanstack/react-query';

import { type ApiError, api } from '@/lib/api-client';

import { getReportsQueryOptions } from './get-reports';

export { issueReportSchema };
export type { IssueReportInput };

export interface IssueReportVariables {
  assessmentId: number;
  data: IssueReportInput;
}

export function issueReport({ assessmentId, data }: IssueReportVariables): Promise<ReportRecord> {
  return api.post<ReportRecord>(`/assessments/${encodeURIComponent(String(assessmentId))}/reports`, data);
}

export function useIssueReport({ mutationConfig }: { mutationConfig?: UseMutationOptions<ReportRecord, ApiError, IssueReportVariables> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation<ReportRecord, ApiError, IssueReportVariables>({
    ...rest,
    mutationFn: issueReport,
    onSuccess: async (...args) => {
      // Every report list (all, per product line, per candidate) shares the 'reports' key.
      await queryClient.invalidateQueries({ queryKey: getReportsQueryOptions().queryKey.slice(0, 1) });
      onSuccess?.(...args);
    },
  });
}
