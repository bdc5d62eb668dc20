import { useEffect, useRef } from 'react';
import { MapContainer, useMap } from 'react-leaflet';
import 'leaflet/dist/leaflet.css';
import '../atlas.css';
import { L } from '../lib/leaflet-global';
import '../lib/geoman';
import type { AtlasSummary } from '../api/types';
import type { AtlasPreferences } from '../lib/atlas-preferences';
import { dayOverlay, nightOverlay } from '../lib/overlay-styles';
import type { AtlasFocus, AtlasSelection } from '../lib/selection';
import { AtlasOverlays } from './atlas-overlays';
import { BasemapLayer } from './basemap-layer';
import { BoundaryEditor } from './boundary-editor';
import type { Polygon } from 'geojson';

interface AtlasMapProps {
  atlas: AtlasSummary;
  preferences: AtlasPreferences;
  attribution: string;
  selection: AtlasSelection | null;
  /** A request to bring a record into view; a new object each time. */
  focus: AtlasFocus | null;
  onSelect: (selection: AtlasSelection) => void;
  editing: { siteId: string; boundary: Polygon | null } | null;
  onBoundaryChange: (polygon: Polygon | null) => void;
  draggableDropsOf: string | null;
  onDropMoved: (siteId: string, drop: number, latitude: number, longitude: number) => void;
}

/** Every point of the summary, for the first view. */
function boundsOf(atlas: AtlasSummary): L.LatLngBounds | null {
  const points: L.LatLngTuple[] = [
    ...atlas.yards.features.map(
      (f) => [f.geometry.coordinates[1], f.geometry.coordinates[0]] as L.LatLngTuple,
    ),
    ...atlas.sites.features.map(
      (f) => [f.properties.latitude, f.properties.longitude] as L.LatLngTuple,
    ),
  ];
  return points.length ? L.latLngBounds(points) : null;
}

/** Fits the operation's places once, then leaves the view to the user. */
function FitOnce({ atlas }: { atlas: AtlasSummary }) {
  const map = useMap();
  const done = useRef(false);
  useEffect(() => {
    if (done.current) return;
    const bounds = boundsOf(atlas);
    if (bounds) map.fitBounds(bounds.pad(0.15), { maxZoom: 11 });
    done.current = true;
  }, [map, atlas]);
  return null;
}

/** Brings into view what was picked outside the map (search, panel links): a site's whole block. */
function FocusOn({ atlas, focus }: { atlas: AtlasSummary; focus: AtlasFocus | null }) {
  const map = useMap();
  useEffect(() => {
    if (!focus) return;
    const { selection } = focus;
    if (selection.kind === 'yard') {
      const yard = atlas.yards.features.find((f) => f.properties.id === selection.id);
      if (yard)
        map.flyTo(
          L.latLng(yard.geometry.coordinates[1], yard.geometry.coordinates[0]),
          Math.max(map.getZoom(), 11),
          { duration: 0.6 },
        );
    } else if (selection.kind === 'site') {
      const site = atlas.sites.features.find((f) => f.properties.id === selection.id);
      if (site?.geometry.type === 'Polygon')
        map.flyToBounds(
          L.latLngBounds(
            site.geometry.coordinates[0].map(([lng, lat]) => [lat, lng] as L.LatLngTuple),
          ).pad(0.5),
          { duration: 0.6, maxZoom: 16 },
        );
      else if (site)
        map.flyTo(
          L.latLng(site.properties.latitude, site.properties.longitude),
          Math.max(map.getZoom(), 13),
          { duration: 0.6 },
        );
    }
    // Only a new focus request moves the map, not a refetch of the same date.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [map, focus]);
  return null;
}

/** Keeps the night class on the map's container (react-leaflet sets className only once). */
function NightClass({ night }: { night: boolean }) {
  const map = useMap();
  useEffect(() => {
    map.getContainer().classList.toggle('atlas-map--night', night);
  }, [map, night]);
  return null;
}

/** The Atlas map: our basemap tiles, then the operation's records drawn on one canvas. */
export function AtlasMap(props: AtlasMapProps) {
  const { atlas, preferences, attribution, selection, onSelect, editing } = props;
  const palette = preferences.night ? nightOverlay : dayOverlay;
  const editingSite =
    editing && atlas.sites.features.find((f) => f.properties.id === editing.siteId);
  return (
    <div role="region" aria-label="Map of yards, sites and moves" className="h-full">
      <MapContainer
        center={[37.5, -98]}
        zoom={4}
        minZoom={2}
        maxZoom={18}
        preferCanvas
        worldCopyJump
        className="atlas-map h-full min-h-[420px] w-full rounded-lg"
      >
        <NightClass night={preferences.night} />
        <BasemapLayer night={preferences.night} attribution={attribution} />
        <FitOnce atlas={atlas} />
        <FocusOn atlas={atlas} focus={props.focus} />
        <AtlasOverlays
          atlas={atlas}
          preferences={preferences}
          palette={palette}
          selection={selection}
          onSelect={onSelect}
          editingSiteId={editing?.siteId ?? null}
          draggableDropsOf={props.draggableDropsOf}
          onDropMoved={props.onDropMoved}
        />
        {editing && (
          <BoundaryEditor
            boundary={editing.boundary}
            colour={editingSite ? palette.selected : palette.contract.none}
            onChange={props.onBoundaryChange}
          />
        )}
      </MapContainer>
    </div>
  );
}
