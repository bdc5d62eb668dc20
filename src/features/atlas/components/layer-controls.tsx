import { useId } from 'react';
import type { AtlasContractStatus } from '../api/types';
import { layerIds, type AtlasPreferences, type LayerId } from '../lib/atlas-preferences';
import {
  contractStateLabels,
  moveLine,
  moveStyleLabels,
  type MoveStyle,
  type OverlayPalette,
  yardRadius,
} from '../lib/overlay-styles';

const layerLabels: Record<LayerId, string> = {
  yards: 'Yards',
  sites: 'Sites',
  drops: 'Drops',
  moves: 'Moves',
  forage: 'Forage rings',
  spray: 'Spray notices',
};

/** Contract states worth a legend line (lapsed ones share a colour). */
const legendStates: Array<AtlasContractStatus | 'none'> = [
  'agreed',
  'in-bloom',
  'offered',
  'draft',
  'released',
  'settled',
  'withdrawn',
  'none',
];

interface LayerControlsProps {
  preferences: AtlasPreferences;
  palette: OverlayPalette;
  onChange: (change: (current: AtlasPreferences) => AtlasPreferences) => void;
}

/** Layer switches (real checkboxes), the night style, the forage radius, and the legend. */
export function LayerControls({ preferences, palette, onChange }: LayerControlsProps) {
  const radiusId = useId();
  const hintId = useId();
  const toggle = (id: LayerId) =>
    onChange((p) => ({ ...p, layers: { ...p.layers, [id]: !p.layers[id] } }));
  return (
    <div className="flex flex-col gap-3 text-sm">
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 font-semibold text-dusk-100">Layers</legend>
        {layerIds.map((id) => (
          <label key={id} className="flex min-h-8 cursor-pointer items-center gap-2">
            <input
              type="checkbox"
              className="size-4 accent-ember-400"
              checked={preferences.layers[id]}
              onChange={() => toggle(id)}
            />
            <LayerSwatch id={id} palette={palette} />
            {layerLabels[id]}
          </label>
        ))}
      </fieldset>
      <div className="flex flex-col gap-1">
        <label htmlFor={radiusId} className="font-semibold text-dusk-100">
          Forage radius (km)
        </label>
        <input
          id={radiusId}
          type="number"
          min={0.5}
          max={20}
          step={0.5}
          inputMode="decimal"
          aria-describedby={hintId}
          className="w-24 rounded-md border border-dusk-500 bg-dusk-900 px-2 py-1 text-dusk-100"
          value={preferences.forageKm}
          onChange={(event) => {
            const value = Number(event.target.value);
            if (Number.isFinite(value) && value >= 0.5 && value <= 20)
              onChange((p) => ({ ...p, forageKm: value }));
          }}
        />
        <p id={hintId} className="text-xs text-dusk-300">
          Most foraging lies within about 6 km of the hive (Beekman &amp; Ratnieks 2000).
        </p>
      </div>
      <label className="flex min-h-8 cursor-pointer items-center gap-2 font-semibold text-dusk-100">
        <input
          type="checkbox"
          className="size-4 accent-rosehip-400"
          checked={preferences.night}
          onChange={() => onChange((p) => ({ ...p, night: !p.night }))}
        />
        Night style
      </label>
      <Legend palette={palette} />
    </div>
  );
}

function LayerSwatch({ id, palette }: { id: LayerId; palette: OverlayPalette }) {
  const colour = {
    yards: palette.yardFill,
    sites: palette.contract.agreed,
    drops: palette.drop,
    moves: palette.move,
    forage: palette.forage,
    spray: palette.spray,
  }[id];
  return (
    <svg width="14" height="14" aria-hidden="true" className="shrink-0">
      {id === 'moves' ? (
        <line x1="1" y1="13" x2="13" y2="1" stroke={colour} strokeWidth="2.5" />
      ) : id === 'forage' || id === 'spray' ? (
        <circle
          cx="7"
          cy="7"
          r="5.5"
          fill="none"
          stroke={colour}
          strokeWidth="1.5"
          strokeDasharray="2 2"
        />
      ) : id === 'sites' ? (
        <rect
          x="1.5"
          y="1.5"
          width="11"
          height="11"
          fill={colour}
          fillOpacity="0.4"
          stroke={colour}
          strokeWidth="1.5"
        />
      ) : (
        <circle cx="7" cy="7" r={id === 'drops' ? 3 : 5.5} fill={colour} />
      )}
    </svg>
  );
}

/** Our legend: what the colours of sites, the line styles of moves and the yard sizes mean. */
function Legend({ palette }: { palette: OverlayPalette }) {
  return (
    <section aria-label="Legend" className="flex flex-col gap-2 border-t border-dusk-700 pt-3">
      <h3 className="font-semibold text-dusk-100">Legend</h3>
      <div>
        <p className="text-xs text-dusk-300">Sites, by contract</p>
        <ul className="mt-1 grid grid-cols-2 gap-x-3 gap-y-0.5">
          {legendStates.map((state) => (
            <li key={state} className="flex items-center gap-1.5">
              <svg width="12" height="12" aria-hidden="true" className="shrink-0">
                <rect width="12" height="12" rx="2" fill={palette.contract[state]} />
              </svg>
              {contractStateLabels[state]}
            </li>
          ))}
        </ul>
      </div>
      <div>
        <p className="text-xs text-dusk-300">Moves</p>
        <ul className="mt-1 flex flex-col gap-0.5">
          {(Object.keys(moveLine) as MoveStyle[]).map((style) => (
            <li key={style} className="flex items-center gap-2">
              <svg width="32" height="8" aria-hidden="true">
                <line
                  x1="0"
                  y1="4"
                  x2="32"
                  y2="4"
                  stroke={palette.move}
                  strokeWidth={moveLine[style].weight}
                  strokeDasharray={moveLine[style].dashArray}
                  strokeOpacity={moveLine[style].opacity}
                />
              </svg>
              {moveStyleLabels[style]}
            </li>
          ))}
        </ul>
      </div>
      <div>
        <p className="text-xs text-dusk-300">Yards, sized by colonies on the date</p>
        <svg width="132" height="44" aria-hidden="true" className="mt-1">
          {[
            [12, 100],
            [46, 400],
            [100, 1000],
          ].map(([x, colonies]) => (
            <circle
              key={colonies}
              cx={x}
              cy="22"
              r={yardRadius(colonies)}
              fill={palette.yardFill}
              stroke={palette.yardStroke}
            />
          ))}
        </svg>
        <p className="text-xs text-dusk-300">100 · 400 · 1,000 colonies</p>
      </div>
    </section>
  );
}
