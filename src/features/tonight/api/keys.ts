/** Query keys of Tonight: one snapshot per day it was opened. */
export const tonightKeys = {
  all: ['tonight'] as const,
  night: (today: string) => [...tonightKeys.all, 'night', today] as const,
};
