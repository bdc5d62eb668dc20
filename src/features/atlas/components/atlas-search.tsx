import { useId, useState } from 'react';
import type { AtlasSummary } from '../api/types';
import type { AtlasSelection } from '../lib/selection';

interface Match {
  selection: AtlasSelection;
  name: string;
  kind: string;
}

/** Yards, sites and growers whose name holds the words typed (case and accents ignored). */
export function searchAtlas(atlas: AtlasSummary, query: string, limit = 8): Match[] {
  const fold = (text: string) => text.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase();
  const words = fold(query).split(/\s+/).filter(Boolean);
  if (words.length === 0) return [];
  const hit = (name: string) => words.every((w) => fold(name).includes(w));
  return [
    ...atlas.yards.features
      .filter((f) => hit(f.properties.name))
      .map((f) => ({
        selection: { kind: 'yard', id: f.properties.id } as const,
        name: f.properties.name,
        kind: 'Yard',
      })),
    ...atlas.sites.features
      .filter((f) => hit(f.properties.name))
      .map((f) => ({
        selection: { kind: 'site', id: f.properties.id } as const,
        name: f.properties.name,
        kind: 'Site',
      })),
    ...atlas.growers
      .filter((g) => hit(g.name))
      .map((g) => ({
        selection: { kind: 'grower', id: g.id } as const,
        name: g.name,
        kind: 'Grower',
      })),
  ].slice(0, limit);
}

/** A search box over the map's yards, sites and growers; results are buttons that select. */
export function AtlasSearch({
  atlas,
  onSelect,
}: {
  atlas: AtlasSummary;
  onSelect: (selection: AtlasSelection) => void;
}) {
  const [query, setQuery] = useState('');
  const inputId = useId();
  const resultsId = useId();
  const matches = searchAtlas(atlas, query);
  return (
    <div role="search" className="relative flex flex-col gap-1">
      <label htmlFor={inputId} className="text-sm font-semibold">
        Find a yard, site or grower
      </label>
      <input
        id={inputId}
        type="search"
        autoComplete="off"
        aria-controls={resultsId}
        className="min-h-10 rounded-md border border-dusk-500 bg-dusk-900 px-3 text-dusk-100 placeholder:text-dusk-400"
        placeholder="Name"
        value={query}
        onChange={(event) => setQuery(event.target.value)}
        onKeyDown={(event) => {
          if (event.key === 'Enter' && matches[0]) {
            onSelect(matches[0].selection);
            setQuery('');
          }
          if (event.key === 'Escape') setQuery('');
        }}
      />
      <div id={resultsId} aria-live="polite">
        {query.trim() !== '' &&
          (matches.length ? (
            <ul className="absolute z-[1000] mt-1 w-full overflow-hidden rounded-md border border-dusk-600 bg-dusk-900 shadow-lg">
              {matches.map((match) => (
                <li key={`${match.kind}-${match.selection.id}`}>
                  <button
                    type="button"
                    className="flex w-full items-center justify-between gap-2 px-3 py-2 text-left hover:bg-dusk-800 focus-visible:bg-dusk-800"
                    onClick={() => {
                      onSelect(match.selection);
                      setQuery('');
                    }}
                  >
                    <span>{match.name}</span>
                    <span className="text-xs text-dusk-300">{match.kind}</span>
                  </button>
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-sm text-dusk-300">Nothing by that name on the map.</p>
          ))}
      </div>
    </div>
  );
}
