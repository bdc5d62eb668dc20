/** Query keys of the Atlas: the summary by date and the basemap's description. */
export const atlasKeys = {
  all: ['atlas'] as const,
  summary: (on: string) => ['atlas', 'summary', on] as const,
  tileSet: ['atlas', 'tile-set'] as const,
};
