import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RuleProfile } from '@shared/engine';
import { api } from '@/lib/api-client';
import type { JurisdictionSummary, VersionSummary } from './get-jurisdictions';

export interface ProfileVersion extends VersionSummary {
  profile: RuleProfile;
}

export interface JurisdictionDetail extends Omit<JurisdictionSummary, 'versions'> {
  versions: ProfileVersion[];
}

export const getJurisdiction = (id: string) => api.get<{ jurisdiction: JurisdictionDetail }>(`/api/jurisdictions/${id}`);

export const getJurisdictionQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['jurisdictions', id], queryFn: () => getJurisdiction(id) });

export const useJurisdiction = (id: string) => useQuery(getJurisdictionQueryOptions(id));
