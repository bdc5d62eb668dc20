import { useEffect } from 'react';
import { useMap } from 'react-leaflet';
import { leafletLayer } from 'protomaps-leaflet';
import '../lib/leaflet-global';
import { dayBasemap, labelRules, nightBasemap, paintRules } from '../lib/basemap-style';

/** Deepest zoom the tile service answers; the renderer over-zooms past it. */
const maxDataZoom = 14;

/**
 * The basemap: Duskhaul's own vector tiles (`/tiles/base/{z}/{x}/{y}.pbf`, same origin) drawn on
 * canvas by protomaps-leaflet with the day or night style.
 */
export function BasemapLayer({ night, attribution }: { night: boolean; attribution: string }) {
  const map = useMap();
  useEffect(() => {
    const palette = night ? nightBasemap : dayBasemap;
    const layer = leafletLayer({
      url: '/tiles/base/{z}/{x}/{y}.pbf',
      maxDataZoom,
      paintRules: paintRules(palette),
      labelRules: labelRules(palette),
      backgroundColor: palette.water,
      attribution,
    });
    layer.addTo(map);
    layer.bringToBack();
    return () => {
      layer.remove();
    };
  }, [map, night, attribution]);
  return null;
}
