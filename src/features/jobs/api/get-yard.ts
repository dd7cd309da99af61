import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Yard } from '@shared/crew/crew-views';
import { api } from '@/lib/api-client';

export const getYard = () => api.get<{ yard: Yard | null }>('/api/crew/yard');

export const getYardQueryOptions = () => queryOptions({ queryKey: ['crew', 'yard'], queryFn: getYard });

export const useYard = () => useQuery(getYardQueryOptions());
