import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JurisdictionDetail } from '@shared/contracts/rule-profiles';
import { api } from '@/lib/api-client';
import { ruleProfileKeys } from '@/lib/query-keys';

export type { JurisdictionDetail, ProfileVersion } from '@shared/contracts/rule-profiles';

export const getJurisdiction = (id: string) =>
  api.get<{ jurisdiction: JurisdictionDetail }>(`/api/jurisdictions/${id}`);

export const getJurisdictionQueryOptions = (id: string) =>
  queryOptions({ queryKey: ruleProfileKeys.one(id), queryFn: () => getJurisdiction(id) });

export const useJurisdiction = (id: string) => useQuery(getJurisdictionQueryOptions(id));
