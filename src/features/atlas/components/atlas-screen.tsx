import { useCallback, useEffect, useState } from 'react';
import type { Polygon } from 'geojson';
import type { SessionUser } from '@shared/schemas/users';
import { Alert } from '@/components/ui/alert';
import { canPlan } from '@/lib/auth';
import { todayIso } from '@/lib/units';
import { useAtlas } from '../api/get-atlas';
import { useTileSet } from '../api/get-tile-set';
import { useMoveDrop } from '../api/move-drop';
import { useAtlasPreferences } from '../lib/atlas-preferences';
import { dayOverlay, nightOverlay } from '../lib/overlay-styles';
import type { AtlasFocus, AtlasSelection } from '../lib/selection';
import { AtlasMap } from './atlas-map';
import { AtlasPanel } from './atlas-panel';
import { AtlasSearch } from './atlas-search';
import { DateControl } from './date-control';
import { LayerControls } from './layer-controls';
import { SiteBoundaryTools } from './site-boundary-tools';

/** The value after it has stopped changing for `ms` (the slider asks for one date, not fifty). */
function useSettled<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

/** The Atlas: map, layer switches and legend, date slider, search and the side panel. */
export function AtlasScreen({ user, units }: { user: SessionUser; units: SessionUser['units'] }) {
  const today = todayIso();
  const [preferences, setPreferences] = useAtlasPreferences();
  const [on, setOn] = useState(today);
  const settledOn = useSettled(on, 250);
  const atlasQuery = useAtlas(settledOn);
  const tileSet = useTileSet();
  const [selection, setSelection] = useState<AtlasSelection | null>(null);
  const [focus, setFocus] = useState<AtlasFocus | null>(null);
  const [editing, setEditing] = useState<{ siteId: string; boundary: Polygon | null } | null>(null);
  const [drawn, setDrawn] = useState<Polygon | null>(null);
  const [dragDropsOf, setDragDropsOf] = useState<string | null>(null);
  const moveDrop = useMoveDrop();
  const planner = canPlan(user);
  const atlas = atlasQuery.data;

  const select = useCallback((next: AtlasSelection | null) => {
    setSelection(next);
    setEditing(null);
    setDrawn(null);
    setDragDropsOf(null);
  }, []);
  /** Selects and brings into view (search results, links in the panel). */
  const selectAndShow = useCallback(
    (next: AtlasSelection | null) => {
      select(next);
      if (next) setFocus({ selection: next });
    },
    [select],
  );

  const onDropMoved = useCallback(
    (siteId: string, drop: number, latitude: number, longitude: number) => {
      const site = atlas?.sites.features.find((f) => f.properties.id === siteId)?.properties;
      if (site) moveDrop.mutate({ siteId, version: site.version, drop, latitude, longitude });
    },
    [atlas, moveDrop],
  );

  if (!atlas) {
    return atlasQuery.error ? (
      <Alert tone="error" title="The map could not load.">
        <p>{(atlasQuery.error as Error).message}</p>
      </Alert>
    ) : (
      <p role="status" className="text-dusk-300">
        Loading the map…
      </p>
    );
  }

  const selectedSite =
    selection?.kind === 'site'
      ? atlas.sites.features.find((f) => f.properties.id === selection.id)
      : undefined;
  const siteTools =
    planner && selectedSite ? (
      <SiteBoundaryTools
        site={selectedSite.properties}
        boundary={selectedSite.geometry.type === 'Polygon' ? selectedSite.geometry : null}
        units={units}
        editing={editing?.siteId === selectedSite.properties.id}
        drawn={drawn}
        onStartEditing={() => {
          setDragDropsOf(null);
          setDrawn(null);
          setEditing({
            siteId: selectedSite.properties.id,
            boundary: selectedSite.geometry.type === 'Polygon' ? selectedSite.geometry : null,
          });
        }}
        onStopEditing={() => {
          setEditing(null);
          setDrawn(null);
        }}
        dragDrops={dragDropsOf === selectedSite.properties.id}
        onDragDrops={(onOff) => setDragDropsOf(onOff ? selectedSite.properties.id : null)}
      />
    ) : undefined;

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-col gap-3 md:flex-row md:items-end md:justify-between">
        <h1 className="text-2xl font-semibold">Atlas</h1>
        <div className="md:w-80">
          <AtlasSearch atlas={atlas} onSelect={selectAndShow} />
        </div>
      </div>
      <DateControl on={on} today={today} onChange={setOn} />
      {moveDrop.error && (
        <Alert tone="error" title="The drop was not moved.">
          <p>{(moveDrop.error as Error).message}</p>
        </Alert>
      )}
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <div
          className="h-[60vh] min-h-[420px] lg:h-[calc(100vh-14rem)]"
          aria-busy={atlasQuery.isFetching || undefined}
        >
          <AtlasMap
            atlas={atlas}
            preferences={preferences}
            attribution={tileSet.data?.attribution ?? 'Natural Earth; US Census Bureau'}
            selection={selection}
            focus={focus}
            onSelect={select}
            editing={editing}
            onBoundaryChange={setDrawn}
            draggableDropsOf={dragDropsOf}
            onDropMoved={onDropMoved}
          />
        </div>
        <div className="flex flex-col gap-4">
          <AtlasPanel
            atlas={atlas}
            selection={selection}
            units={units}
            onSelect={select}
            siteTools={siteTools}
          />
          <details open className="rounded-lg border border-dusk-700 bg-dusk-850 p-4">
            <summary className="cursor-pointer font-semibold">Layers and legend</summary>
            <div className="mt-3">
              <LayerControls
                preferences={preferences}
                palette={preferences.night ? nightOverlay : dayOverlay}
                onChange={setPreferences}
              />
            </div>
          </details>
        </div>
      </div>
    </div>
  );
}
