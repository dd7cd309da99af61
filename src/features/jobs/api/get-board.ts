import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BoardSort } from '@shared/crew/crew-inputs';
import type { BoardView } from '@shared/crew/crew-views';
import { api } from '@/lib/api-client';

export const getBoard = (sort: BoardSort) => api.get<BoardView>('/api/crew/board', { sort });

export const getBoardQueryOptions = (sort: BoardSort = 'date') =>
  queryOptions({ queryKey: ['crew', 'board', sort], queryFn: () => getBoard(sort) });

export const useBoard = (sort: BoardSort) => useQuery(getBoardQueryOptions(sort));
