import { useId, useState } from 'react';
import type { Polygon } from 'geojson';
import { Button } from '@/components/ui/button';
import { FormAlert } from '@/components/ui/form-alert';
import type { Units } from '@shared/schemas/users';
import { formatArea, formatCount } from '@/lib/units';
import { polygonText, useSaveBoundary } from '../api/save-boundary';
import type { AtlasSiteProperties, SiteBoundaryResult } from '../api/types';
import { boundaryFileToGeoJsonText } from '../lib/boundary-file';

interface SiteBoundaryToolsProps {
  site: AtlasSiteProperties;
  boundary: Polygon | null;
  units: Units;
  /** The boundary being drawn or edited on the map (null when not editing). */
  editing: boolean;
  drawn: Polygon | null;
  onStartEditing: () => void;
  onStopEditing: () => void;
  dragDrops: boolean;
  onDragDrops: (on: boolean) => void;
}

/** A planner's boundary tools for the selected site: draw or edit, upload a file, drag drops. */
export function SiteBoundaryTools(props: SiteBoundaryToolsProps) {
  const { site, boundary, units, editing, drawn } = props;
  const save = useSaveBoundary();
  const fileId = useId();
  const palletsId = useId();
  const [palletsPerDrop, setPalletsPerDrop] = useState(4);
  const [fileError, setFileError] = useState<string | null>(null);
  const [result, setResult] = useState<SiteBoundaryResult | null>(null);

  const send = (text: string) =>
    save.mutate(
      { siteId: site.id, version: site.version, text, palletsPerDrop },
      {
        onSuccess: (saved) => {
          setResult(saved);
          props.onStopEditing();
        },
      },
    );

  return (
    <section
      aria-label="Boundary"
      className="flex flex-col gap-2 rounded-md border border-dusk-700 p-3 text-sm"
    >
      <h3 className="font-semibold">Boundary and drops</h3>
      <div className="flex items-center gap-2">
        <label htmlFor={palletsId}>Pallets per drop</label>
        <input
          id={palletsId}
          type="number"
          min={1}
          max={100}
          className="w-16 rounded-md border border-dusk-500 bg-dusk-900 px-2 py-1"
          value={palletsPerDrop}
          onChange={(event) =>
            setPalletsPerDrop(
              Math.max(1, Math.min(100, Math.round(Number(event.target.value)) || 1)),
            )
          }
        />
      </div>
      {editing ? (
        <>
          <p className="text-dusk-300">
            {boundary
              ? 'Drag the corners; click an edge to add a corner; right-click a corner to remove it.'
              : 'Click the map for each corner; double-click the last one to close the block.'}
          </p>
          <div className="flex flex-wrap gap-2">
            <Button
              size="sm"
              disabled={!drawn}
              busy={save.isPending}
              onClick={() => drawn && send(polygonText(drawn))}
            >
              Save boundary
            </Button>
            <Button size="sm" variant="ghost" onClick={props.onStopEditing}>
              Cancel
            </Button>
          </div>
        </>
      ) : (
        <div className="flex flex-wrap gap-2">
          <Button size="sm" variant="secondary" onClick={props.onStartEditing}>
            {boundary ? 'Edit boundary' : 'Draw boundary'}
          </Button>
          {site.dropCount > 0 && (
            <label className="flex items-center gap-2">
              <input
                type="checkbox"
                className="size-4 accent-ember-400"
                checked={props.dragDrops}
                onChange={(event) => props.onDragDrops(event.target.checked)}
              />
              Move drops by dragging
            </label>
          )}
        </div>
      )}
      <div className="flex flex-col gap-1">
        <label htmlFor={fileId}>Upload a boundary (GeoJSON or KML)</label>
        <input
          id={fileId}
          type="file"
          accept=".geojson,.json,.kml,application/geo+json,application/json,application/vnd.google-earth.kml+xml"
          className="text-dusk-200 file:mr-2 file:rounded-md file:border file:border-dusk-500 file:bg-dusk-800 file:px-2 file:py-1 file:text-dusk-100"
          onChange={async (event) => {
            const file = event.target.files?.[0];
            event.target.value = '';
            if (!file) return;
            setFileError(null);
            try {
              send(await boundaryFileToGeoJsonText(file));
            } catch (error) {
              setFileError((error as Error).message);
            }
          }}
        />
      </div>
      {fileError && (
        <p role="alert" className="text-rosehip-300">
          {fileError}
        </p>
      )}
      <FormAlert error={save.error} />
      {result && !save.isPending && (
        <p role="status" className="text-sage-300">
          Saved: {formatArea(result.plan.areaHa, units)}
          {result.plan.colonies !== null
            ? `, ${formatCount(result.plan.colonies)} colonies on ${formatCount(result.plan.pallets ?? 0)} pallets in ${result.plan.dropCount} drops.`
            : ' (a honey location has no stocking rate, so no drops).'}
        </p>
      )}
    </section>
  );
}
