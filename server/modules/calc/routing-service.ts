import type { LatLon } from '../../../shared/domain/distance';

/** Road distance between two points from an OSRM-compatible HTTP API, or null when it fails. */
export interface RoadDistance {
  distanceKm(origin: LatLon, destination: LatLon): Promise<number | null>;
}

/**
 * Asks `GET {base}/route/v1/driving/{lon},{lat};{lon},{lat}?overview=false` (the OSRM route
 * service) for the first route's distance. Any failure or slow answer falls back to null, and the
 * caller uses great circle × road factor instead.
 */
export function osrmRoadDistance(baseUrl: string, timeoutMs = 3_000): RoadDistance {
  return {
    async distanceKm(origin, destination) {
      const url = `${baseUrl.replace(/\/$/, '')}/route/v1/driving/${origin.lon},${origin.lat};${destination.lon},${destination.lat}?overview=false`;
      try {
        const response = await fetch(url, { signal: AbortSignal.timeout(timeoutMs) });
        if (!response.ok) return null;
        const body = (await response.json()) as {
          code?: string;
          routes?: Array<{ distance?: number }>;
        };
        const metres = body.routes?.[0]?.distance;
        return body.code === 'Ok' &&
          typeof metres === 'number' &&
          Number.isFinite(metres) &&
          metres >= 0
          ? metres / 1000
          : null;
      } catch {
        return null;
      }
    },
  };
}
