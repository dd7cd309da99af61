import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PeopleFilter, PersonView } from '@shared/contracts/people';
import { api } from '@/lib/api-client';
import { peopleKeys } from '@/lib/query-keys';

export type UserRow = PersonView;

export const getUsers = (filter: PeopleFilter) => api.get<{ users: PersonView[] }>('/api/users', filter);

export const getUsersQueryOptions = (filter: PeopleFilter = {}) =>
  queryOptions({ queryKey: peopleKeys.list(filter), queryFn: () => getUsers(filter) });

export const useUsers = (filter: PeopleFilter = {}) => useQuery(getUsersQueryOptions(filter));
