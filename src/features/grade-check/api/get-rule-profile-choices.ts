import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RuleProfile } from '@shared/engine';
import { api } from '@/lib/api-client';

export interface JurisdictionChoice {
  id: string;
  name: string;
  authority: string;
  currentVersionId: string | null;
  versions: { id: string; version: number; status: 'draft' | 'published' }[];
}

export const getRuleProfileChoices = () => api.get<{ jurisdictions: JurisdictionChoice[] }>('/api/jurisdictions');

export const getRuleProfileChoicesQueryOptions = () =>
  queryOptions({ queryKey: ['grade-check', 'jurisdictions'], queryFn: getRuleProfileChoices });

export const useRuleProfileChoices = () => useQuery(getRuleProfileChoicesQueryOptions());

export const getProfileVersion = (id: string) =>
  api.get<{ version: { id: string; version: number; status: string; profile: RuleProfile } }>(`/api/rule-profile-versions/${id}`);

// A published version never changes, so it never goes stale.
export const getProfileVersionQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['grade-check', 'profile-version', id], queryFn: () => getProfileVersion(id), staleTime: Infinity, enabled: Boolean(id) });

export const useProfileVersion = (id: string | undefined) => useQuery(getProfileVersionQueryOptions(id ?? ''));
