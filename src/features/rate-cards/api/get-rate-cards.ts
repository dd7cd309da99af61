import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RateCardsAnswer } from '@shared/contracts/rate-cards';
import { api } from '@/lib/api-client';
import { rateCardKeys } from '@/lib/query-keys';

export type { RateCardView, RateCardPrices } from '@shared/contracts/rate-cards';

export const getRateCards = () => api.get<RateCardsAnswer>('/api/rate-cards');

export const getRateCardsQueryOptions = () => queryOptions({ queryKey: rateCardKeys.list(), queryFn: getRateCards });

export const useRateCards = () => useQuery(getRateCardsQueryOptions());
