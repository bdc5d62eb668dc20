/** Query keys of yards: ['yards','list',filters] and ['yards','detail',id]. */
export const yardKeys = {
  all: ['yards'] as const,
  lists: () => [...yardKeys.all, 'list'] as const,
  list: (filters: { archived?: boolean } = {}) => [...yardKeys.lists(), filters] as const,
  details: () => [...yardKeys.all, 'detail'] as const,
  detail: (id: string) => [...yardKeys.details(), id] as const,
};
