import { useEffect } from 'react';
import { useMap } from 'react-leaflet';
import type { Polygon } from 'geojson';
import { L } from '../lib/leaflet-global';

interface BoundaryEditorProps {
  /** The boundary to edit, or null to draw a new one. */
  boundary: Polygon | null;
  colour: string;
  /** Called with the polygon after every vertex change (null while nothing is drawn). */
  onChange: (polygon: Polygon | null) => void;
}

type EditableLayer = L.Polygon & {
  pm: { enable: (options?: object) => void; disable: () => void };
};
type GeomanMap = L.Map & {
  pm: {
    enableDraw: (shape: string, options?: object) => void;
    disableDraw: () => void;
    setGlobalOptions: (options: object) => void;
  };
};

/**
 * Draws or edits one site boundary on the map with leaflet-geoman: drag vertices, add them on
 * the edges, remove one with a right-click. The outline stays on the map until the editor closes.
 */
export function BoundaryEditor({ boundary, colour, onChange }: BoundaryEditorProps) {
  const map = useMap() as GeomanMap;
  useEffect(() => {
    let layer: EditableLayer | null = null;
    const report = () => {
      const geometry = layer?.toGeoJSON().geometry;
      onChange(geometry?.type === 'Polygon' ? geometry : null);
    };
    const edit = (next: EditableLayer) => {
      layer = next;
      layer.setStyle({ color: colour, weight: 3, fillOpacity: 0.15 });
      layer.pm.enable({ allowSelfIntersection: false });
      layer.on('pm:edit pm:vertexadded pm:vertexremoved pm:markerdragend', report);
      report();
    };
    const created = (event: { layer: L.Layer }) => {
      map.pm.disableDraw();
      edit(event.layer as EditableLayer);
    };
    map.pm.setGlobalOptions({ snappable: false, pathOptions: { color: colour } });
    if (boundary) {
      const existing = L.polygon(
        boundary.coordinates.map((ring) =>
          ring.slice(0, -1).map(([lng, lat]) => [lat, lng]),
        ) as L.LatLngExpression[][],
      ).addTo(map) as EditableLayer;
      map.fitBounds(existing.getBounds().pad(0.4));
      edit(existing);
    } else {
      map.on('pm:create', created);
      map.pm.enableDraw('Polygon', { allowSelfIntersection: false, finishOn: 'dblclick' });
    }
    return () => {
      map.off('pm:create', created);
      map.pm.disableDraw();
      layer?.pm.disable();
      layer?.remove();
    };
    // The editor restarts only when another boundary is handed in.
  }, [map, boundary, colour, onChange]);
  return null;
}
