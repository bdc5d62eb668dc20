/** What the side panel shows: one record of the map, by kind and id. */
export type AtlasSelection =
  | { kind: 'yard'; id: string }
  | { kind: 'site'; id: string }
  | { kind: 'move'; id: string }
  | { kind: 'spray'; id: string }
  | { kind: 'grower'; id: string };

/** GeoJSON [longitude, latitude] as Leaflet's [latitude, longitude]. */
export const toLatLng = (position: number[]): [number, number] => [position[1], position[0]];

/** A request to bring a selection into view (each request a new object, so repeats still move). */
export interface AtlasFocus {
  selection: AtlasSelection;
}
