import { Circle, CircleMarker, Marker, Polygon, Polyline, Tooltip } from 'react-leaflet';
import { useMemo } from 'react';
import { L } from '../lib/leaflet-global';
import type { AtlasSummary } from '../api/types';
import type { AtlasPreferences } from '../lib/atlas-preferences';
import { moveLine, moveStyleOf, yardRadius, type OverlayPalette } from '../lib/overlay-styles';
import { toLatLng, type AtlasSelection } from '../lib/selection';

interface AtlasOverlaysProps {
  atlas: AtlasSummary;
  preferences: AtlasPreferences;
  palette: OverlayPalette;
  selection: AtlasSelection | null;
  onSelect: (selection: AtlasSelection) => void;
  /** The site whose boundary is being edited: its outline is left to the editor. */
  editingSiteId: string | null;
  /** The site whose drops can be dragged, and what to do when one is dropped. */
  draggableDropsOf: string | null;
  onDropMoved: (siteId: string, drop: number, latitude: number, longitude: number) => void;
}

const dropIcon = (night: boolean) =>
  L.divIcon({
    className: night ? 'atlas-drop-handle atlas-drop-handle--night' : 'atlas-drop-handle',
    iconSize: [16, 16],
  });

/** The operation's records on the map: forage rings, sites, moves, yards, drops, spray reach. */
export function AtlasOverlays({
  atlas,
  preferences,
  palette,
  selection,
  onSelect,
  editingSiteId,
  draggableDropsOf,
  onDropMoved,
}: AtlasOverlaysProps) {
  const { layers, forageKm, night } = preferences;
  const isSelected = (kind: AtlasSelection['kind'], id: string) =>
    selection?.kind === kind && selection.id === id;
  const handle = useMemo(() => dropIcon(night), [night]);

  return (
    <>
      {layers.forage &&
        [
          ...atlas.yards.features.map((f) => f.geometry.coordinates),
          ...atlas.sites.features.map((f) => [f.properties.longitude, f.properties.latitude]),
        ].map((position, i) => (
          <Circle
            key={`forage-${i}`}
            center={toLatLng(position)}
            radius={forageKm * 1000}
            interactive={false}
            pathOptions={{
              color: palette.forage,
              weight: 1,
              dashArray: '3 5',
              fillColor: palette.forage,
              fillOpacity: 0.05,
            }}
          />
        ))}

      {layers.spray &&
        atlas.sprayNotices.features.map((f) => (
          <Circle
            key={`spray-${f.properties.id}`}
            center={toLatLng(f.geometry.coordinates)}
            radius={f.properties.reachKm * 1000}
            eventHandlers={{ click: () => onSelect({ kind: 'spray', id: f.properties.id }) }}
            pathOptions={{
              color: palette.spray,
              weight: isSelected('spray', f.properties.id) ? 3 : 2,
              dashArray: '10 4 2 4',
              fillColor: palette.spray,
              fillOpacity: 0.08,
            }}
          >
            <Tooltip>
              Spray: {f.properties.product} at {f.properties.siteName}
            </Tooltip>
          </Circle>
        ))}

      {layers.sites &&
        atlas.sites.features.map((f) => {
          const colour = palette.contract[f.properties.contractState];
          const selected = isSelected('site', f.properties.id);
          const click = { click: () => onSelect({ kind: 'site', id: f.properties.id }) };
          const tooltip = <Tooltip>{f.properties.name}</Tooltip>;
          if (f.geometry.type === 'Polygon' && f.properties.id !== editingSiteId)
            return (
              <Polygon
                key={`site-${f.properties.id}`}
                positions={f.geometry.coordinates.map((ring) => ring.map(toLatLng))}
                eventHandlers={click}
                pathOptions={{
                  color: selected ? palette.selected : colour,
                  weight: selected ? 3 : 2,
                  fillColor: colour,
                  fillOpacity: night ? 0.18 : 0.3,
                }}
              >
                {tooltip}
              </Polygon>
            );
          return (
            <CircleMarker
              key={`site-${f.properties.id}`}
              center={[f.properties.latitude, f.properties.longitude]}
              radius={7}
              eventHandlers={click}
              pathOptions={{
                color: selected ? palette.selected : colour,
                weight: selected ? 3 : 2,
                fillColor: colour,
                fillOpacity: 0.5,
                dashArray: '3 2',
              }}
            >
              {tooltip}
            </CircleMarker>
          );
        })}

      {layers.moves &&
        atlas.moves.features.map((f) => {
          const style = moveLine[moveStyleOf(f.properties.status)];
          const lines =
            f.geometry.type === 'LineString' ? [f.geometry.coordinates] : f.geometry.coordinates;
          const selected = isSelected('move', f.properties.id);
          return (
            <Polyline
              key={`move-${f.properties.id}`}
              positions={lines.map((line) => line.map(toLatLng))}
              eventHandlers={{ click: () => onSelect({ kind: 'move', id: f.properties.id }) }}
              pathOptions={{
                color: selected ? palette.selected : palette.move,
                weight: style.weight + (selected ? 1.5 : 0),
                dashArray: style.dashArray,
                opacity: style.opacity,
              }}
            >
              <Tooltip sticky>
                {f.properties.name} · {f.properties.nightOf}
              </Tooltip>
            </Polyline>
          );
        })}

      {layers.drops &&
        atlas.drops.features.map((f) =>
          f.properties.siteId === draggableDropsOf ? (
            <Marker
              key={`drop-${f.properties.siteId}-${f.properties.drop}`}
              position={toLatLng(f.geometry.coordinates)}
              icon={handle}
              draggable
              keyboard
              title={`Drop ${f.properties.drop} of ${f.properties.siteName}: drag to move`}
              eventHandlers={{
                dragend: (event) => {
                  const { lat, lng } = (event.target as L.Marker).getLatLng();
                  onDropMoved(f.properties.siteId, f.properties.drop, lat, lng);
                },
              }}
            />
          ) : (
            <CircleMarker
              key={`drop-${f.properties.siteId}-${f.properties.drop}`}
              center={toLatLng(f.geometry.coordinates)}
              radius={3.5}
              eventHandlers={{ click: () => onSelect({ kind: 'site', id: f.properties.siteId }) }}
              pathOptions={{
                color: palette.drop,
                weight: 1,
                fillColor: palette.drop,
                fillOpacity: 0.9,
              }}
            >
              <Tooltip>
                Drop {f.properties.drop}: {f.properties.pallets} pallets, {f.properties.colonies}{' '}
                colonies
              </Tooltip>
            </CircleMarker>
          ),
        )}

      {layers.yards &&
        atlas.yards.features.map((f) => {
          const selected = isSelected('yard', f.properties.id);
          return (
            <CircleMarker
              key={`yard-${f.properties.id}`}
              center={toLatLng(f.geometry.coordinates)}
              radius={yardRadius(f.properties.colonies)}
              eventHandlers={{ click: () => onSelect({ kind: 'yard', id: f.properties.id }) }}
              pathOptions={{
                color: selected ? palette.selected : palette.yardStroke,
                weight: selected ? 3 : 1.5,
                fillColor: palette.yardFill,
                fillOpacity: f.properties.colonies > 0 ? 0.85 : 0.25,
              }}
            >
              <Tooltip>
                {f.properties.name}: {f.properties.colonies} colonies
              </Tooltip>
            </CircleMarker>
          );
        })}
    </>
  );
}
