import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JurisdictionSummary } from '@shared/contracts/rule-profiles';
import { api } from '@/lib/api-client';
import { ruleProfileKeys } from '@/lib/query-keys';

export type { JurisdictionSummary, VersionSummary } from '@shared/contracts/rule-profiles';

export const getJurisdictions = () => api.get<{ jurisdictions: JurisdictionSummary[] }>('/api/jurisdictions');

export const getJurisdictionsQueryOptions = () =>
  queryOptions({ queryKey: ruleProfileKeys.list(), queryFn: getJurisdictions });

export const useJurisdictions = () => useQuery(getJurisdictionsQueryOptions());
