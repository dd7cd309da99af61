import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { EmailRow } from './get-emails';

export interface EmailDetail extends EmailRow { textBody: string; htmlBody: string }

export const getEmail = (id: string) => api.get<{ email: EmailDetail }>(`/api/emails/${id}`);

export const getEmailQueryOptions = (id: string) => queryOptions({ queryKey: ['emails', 'one', id], queryFn: () => getEmail(id) });

export const useEmail = (id: string) => useQuery(getEmailQueryOptions(id));
