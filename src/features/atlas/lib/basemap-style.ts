/**
 * Duskhaul's own basemap styles for protomaps-leaflet: paint and label rules for the built-in
 * boundary tiles (land, countries, states, counties, borders, labels) and for an operator's
 * OpenStreetMap archive in the OpenMapTiles layer schema (water, landcover, landuse, park,
 * transportation, boundary, place, transportation_name), which tilemaker and planetiler write.
 */
import {
  CenteredTextSymbolizer,
  LineSymbolizer,
  LineLabelSymbolizer,
  PolygonSymbolizer,
  type LabelRule,
  type PaintRule,
} from 'protomaps-leaflet';

/** Colours of one style. */
export interface BasemapPalette {
  water: string;
  land: string;
  green: string;
  urban: string;
  countryBorder: string;
  stateBorder: string;
  countyBorder: string;
  majorRoad: string;
  minorRoad: string;
  label: string;
  labelHalo: string;
  font: string;
}

/** Day: pale paper land, quiet blue-grey water, soft warm borders. */
export const dayBasemap: BasemapPalette = {
  water: '#d3dde4',
  land: '#f3efe4',
  green: '#e2e8cf',
  urban: '#ebe4d6',
  countryBorder: '#8c7b62',
  stateBorder: '#b09d82',
  countyBorder: '#d8ccb8',
  majorRoad: '#d9a75f',
  minorRoad: '#ffffff',
  label: '#5f5545',
  labelHalo: '#f3efe4',
  font: '"IBM Plex Sans", system-ui, sans-serif',
};

/** Night: near-black, deep red lines, dim labels, for eyes adapted to the dark. */
export const nightBasemap: BasemapPalette = {
  water: '#000000',
  land: '#0d0504',
  green: '#120605',
  urban: '#160806',
  countryBorder: '#8a1c12',
  stateBorder: '#5e140d',
  countyBorder: '#35100b',
  majorRoad: '#6b1a11',
  minorRoad: '#3a0e09',
  label: '#7a2a20',
  labelHalo: '#0d0504',
  font: '"IBM Plex Sans", system-ui, sans-serif',
};

type Props = Record<string, unknown>;
const kind = (props: Props) => String(props.kind ?? props.class ?? '');

/** Paint rules, drawn in order (water is the background colour). */
export function paintRules(p: BasemapPalette): PaintRule[] {
  const fill = (fillColour: string) => new PolygonSymbolizer({ fill: fillColour });
  return [
    // Built-in boundaries.
    { dataLayer: 'land', symbolizer: fill(p.land) },
    {
      dataLayer: 'borders',
      symbolizer: new LineSymbolizer({ color: p.countyBorder, width: 0.6 }),
      filter: (_z, f) => kind(f.props) === 'county',
    },
    {
      dataLayer: 'borders',
      symbolizer: new LineSymbolizer({
        color: p.stateBorder,
        width: 1,
        dash: [5, 3],
        dashColor: p.stateBorder,
      }),
      filter: (_z, f) => kind(f.props) === 'state',
    },
    {
      dataLayer: 'borders',
      symbolizer: new LineSymbolizer({ color: p.countryBorder, width: 1.4 }),
      filter: (_z, f) => kind(f.props) === 'country',
    },
    // OpenMapTiles schema (an operator's OSM archive).
    { dataLayer: 'landcover', symbolizer: fill(p.green) },
    { dataLayer: 'park', symbolizer: fill(p.green) },
    {
      dataLayer: 'landuse',
      symbolizer: fill(p.urban),
      filter: (_z, f) =>
        ['residential', 'commercial', 'industrial', 'retail'].includes(kind(f.props)),
    },
    { dataLayer: 'water', symbolizer: fill(p.water) },
    { dataLayer: 'waterway', symbolizer: new LineSymbolizer({ color: p.water, width: 1 }) },
    {
      dataLayer: 'transportation',
      symbolizer: new LineSymbolizer({ color: p.minorRoad, width: (z) => (z >= 13 ? 2 : 1) }),
      filter: (_z, f) => ['minor', 'tertiary', 'service', 'track'].includes(kind(f.props)),
    },
    {
      dataLayer: 'transportation',
      symbolizer: new LineSymbolizer({ color: p.majorRoad, width: (z) => (z >= 10 ? 2.5 : 1.2) }),
      filter: (_z, f) => ['motorway', 'trunk', 'primary', 'secondary'].includes(kind(f.props)),
    },
    {
      dataLayer: 'boundary',
      symbolizer: new LineSymbolizer({
        color: p.stateBorder,
        width: 1,
        dash: [5, 3],
        dashColor: p.stateBorder,
      }),
    },
  ];
}

/** Label rules: country and state names from the boundaries; places and roads from an archive. */
export function labelRules(p: BasemapPalette): LabelRule[] {
  const text = (size: number, weight = 400) =>
    new CenteredTextSymbolizer({
      labelProps: ['name:en', 'name'],
      fill: p.label,
      stroke: p.labelHalo,
      width: 2,
      font: `${weight} ${size}px ${p.font}`,
    });
  return [
    {
      dataLayer: 'labels',
      symbolizer: text(13, 600),
      filter: (_z, f) => kind(f.props) === 'country',
    },
    { dataLayer: 'labels', symbolizer: text(12), filter: (_z, f) => kind(f.props) === 'state' },
    { dataLayer: 'labels', symbolizer: text(10), filter: (_z, f) => kind(f.props) === 'county' },
    { dataLayer: 'place', symbolizer: text(12, 500) },
    {
      dataLayer: 'transportation_name',
      symbolizer: new LineLabelSymbolizer({
        labelProps: ['name:en', 'name'],
        fill: p.label,
        stroke: p.labelHalo,
        width: 2,
        font: `400 10px ${p.font}`,
      }),
    },
  ];
}
