import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EmailDetailView } from '@shared/contracts/emails';
import { api } from '@/lib/api-client';
import { emailKeys } from '@/lib/query-keys';

export type { EmailDetailView as EmailDetail } from '@shared/contracts/emails';

export const getEmail = (id: string) => api.get<{ email: EmailDetailView }>(`/api/emails/${id}`);

export const getEmailQueryOptions = (id: string) =>
  queryOptions({ queryKey: emailKeys.one(id), queryFn: () => getEmail(id) });

export const useEmail = (id: string) => useQuery(getEmailQueryOptions(id));
