import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EntranceReport, laserSetup, ProposedProfile } from '@shared/engine';
import type { RequestStatus } from '@shared/workflow/statuses';
import { api } from '@/lib/api-client';
import type { SavedInputs } from '../lib/build-inputs';

export interface CheckRequestHeader {
  id: string;
  reference: string;
  status: RequestStatus;
  version: number;
  applicantName: string;
  siteAddress: string;
  roadName: string;
  jurisdictionId: string | null;
  application: { site?: { postedSpeedMph?: number | null } };
}

export interface SavedCheck {
  id: string;
  requestId: string;
  number: number;
  ruleProfileVersionId: string;
  engineVersion: string;
  passed: boolean;
  summary: string;
  attachedAt: string | null;
  createdAt: string;
  inputs: SavedInputs;
  results: { report: EntranceReport; laser?: ReturnType<typeof laserSetup>; proposal?: ProposedProfile; surveyed?: EntranceReport };
}

export const getGradeChecks = (requestId: string) =>
  api.get<{ request: CheckRequestHeader; checks: SavedCheck[] }>(`/api/requests/${requestId}/grade-checks`);

export const getGradeChecksQueryOptions = (requestId: string) =>
  queryOptions({ queryKey: ['grade-checks', requestId], queryFn: () => getGradeChecks(requestId) });

export const useGradeChecks = (requestId: string) => useQuery(getGradeChecksQueryOptions(requestId));
