import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProfileVersion } from '@shared/contracts/rule-profiles';
import { api } from '@/lib/api-client';
import { ruleProfileKeys } from '@/lib/query-keys';

export const getProfileVersion = (id: string) =>
  api.get<{ version: ProfileVersion }>(`/api/rule-profile-versions/${id}`);

export const getProfileVersionQueryOptions = (id: string) =>
  queryOptions({ queryKey: ruleProfileKeys.version(id), queryFn: () => getProfileVersion(id), enabled: Boolean(id) });

export const useProfileVersion = (id: string | undefined) => useQuery(getProfileVersionQueryOptions(id ?? ''));
