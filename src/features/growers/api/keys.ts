/** Query keys of growers: ['growers','list',filters] and ['growers','detail',id]. */
export const growerKeys = {
  all: ['growers'] as const,
  lists: () => [...growerKeys.all, 'list'] as const,
  list: (filters: { q?: string } = {}) => [...growerKeys.lists(), filters] as const,
  details: () => [...growerKeys.all, 'detail'] as const,
  detail: (id: string) => [...growerKeys.details(), id] as const,
};
