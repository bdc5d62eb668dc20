import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { Person } from '../types';
import { settingsKeys } from './keys';

export const getPeople = () => api.get<ListResult<Person>>('/api/users');

export const getPeopleQueryOptions = () =>
  queryOptions({ queryKey: settingsKeys.peopleList(), queryFn: getPeople });

export const usePeople = () => useQuery(getPeopleQueryOptions());
