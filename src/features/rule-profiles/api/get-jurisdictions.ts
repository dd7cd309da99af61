import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface VersionSummary {
  id: string;
  jurisdictionId: string;
  version: number;
  status: 'draft' | 'published';
  publishedAt: string | null;
  changeNote: string;
  createdAt: string;
}

export interface JurisdictionSummary {
  id: string;
  slug: string;
  name: string;
  authority: string;
  currentVersionId: string | null;
  versions: VersionSummary[];
}

export const getJurisdictions = () => api.get<{ jurisdictions: JurisdictionSummary[] }>('/api/jurisdictions');

export const getJurisdictionsQueryOptions = () => queryOptions({ queryKey: ['jurisdictions'], queryFn: getJurisdictions });

export const useJurisdictions = () => useQuery(getJurisdictionsQueryOptions());
