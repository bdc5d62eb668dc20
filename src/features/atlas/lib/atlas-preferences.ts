import { useCallback, useState } from 'react';

/** The switchable layers of the Atlas. */
export const layerIds = ['yards', 'sites', 'drops', 'moves', 'forage', 'spray'] as const;
export type LayerId = (typeof layerIds)[number];

/** What the user set on the map, kept on this device. */
export interface AtlasPreferences {
  night: boolean;
  layers: Record<LayerId, boolean>;
  /** Radius of the forage rings, km. */
  forageKm: number;
}

/** Default ring of about 3 km: most foraging lies within about 6 km (Beekman & Ratnieks 2000). */
export const defaultForageKm = 3;

const storageKey = 'duskhaul.atlas.preferences.v1';

export const defaultPreferences: AtlasPreferences = {
  night: false,
  layers: { yards: true, sites: true, drops: true, moves: true, forage: false, spray: true },
  forageKm: defaultForageKm,
};

/** Reads saved preferences, ignoring anything malformed. */
export function readPreferences(
  storage: Pick<Storage, 'getItem'> = localStorage,
): AtlasPreferences {
  try {
    const saved = JSON.parse(
      storage.getItem(storageKey) ?? 'null',
    ) as Partial<AtlasPreferences> | null;
    if (!saved || typeof saved !== 'object') return defaultPreferences;
    const layers = { ...defaultPreferences.layers };
    for (const id of layerIds)
      if (typeof saved.layers?.[id] === 'boolean') layers[id] = saved.layers[id];
    const forageKm = Number(saved.forageKm);
    return {
      night: saved.night === true,
      layers,
      forageKm:
        Number.isFinite(forageKm) && forageKm > 0 && forageKm <= 20 ? forageKm : defaultForageKm,
    };
  } catch {
    return defaultPreferences;
  }
}

/** The preferences and a setter that also saves them (quietly, when storage is full or off). */
export function useAtlasPreferences() {
  const [preferences, setState] = useState(() => readPreferences());
  const update = useCallback((change: (current: AtlasPreferences) => AtlasPreferences) => {
    setState((current) => {
      const next = change(current);
      try {
        localStorage.setItem(storageKey, JSON.stringify(next));
      } catch {
        // Private browsing or a full store: the setting lasts for this visit only.
      }
      return next;
    });
  }, []);
  return [preferences, update] as const;
}
