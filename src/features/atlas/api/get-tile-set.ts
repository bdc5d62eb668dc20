import { queryOptions, useQuery } from '@tanstack/react-query';
import { atlasKeys } from './keys';

/** What /tiles/base.json says of the basemap: the built-in boundaries or an OSM archive. */
export interface TileSet {
  source: 'boundaries' | 'mbtiles';
  name: string;
  minzoom: number;
  maxzoom: number;
  attribution: string;
  vector_layers: Array<{ id: string }>;
}

export async function getTileSet(): Promise<TileSet> {
  const response = await fetch('/tiles/base.json', { headers: { Accept: 'application/json' } });
  if (!response.ok) throw new Error(`The map tiles are not available (${response.status}).`);
  return (await response.json()) as TileSet;
}

export const getTileSetQueryOptions = () =>
  queryOptions({ queryKey: atlasKeys.tileSet, queryFn: getTileSet, staleTime: Infinity });

export const useTileSet = () => useQuery(getTileSetQueryOptions());
