/**
 * Great-circle distance and positions along the great circle (turf: haversine on a sphere of
 * radius 6,371.0088 km, the IUGG mean radius). Within 0.5 % of the WGS84 geodesic (GeographicLib).
 */
import { distance, point } from '@turf/turf';
import { assertInRange, assertLatLon } from './guards';

/** A WGS84 position in degrees. */
export interface LatLon {
  /** Latitude, degrees north (−90..90). */
  lat: number;
  /** Longitude, degrees east (−180..180). */
  lon: number;
}

/** Great-circle distance between two positions, km. */
export function greatCircleDistanceKm(from: LatLon, to: LatLon): number {
  assertLatLon('from', from.lat, from.lon);
  assertLatLon('to', to.lat, to.lon);
  return distance(point([from.lon, from.lat]), point([to.lon, to.lat]), { units: 'kilometers' });
}

/**
 * Position a share (0..1) of the way along the great circle from `from` to `to`, by spherical
 * interpolation (Ed Williams, *Aviation Formulary*, "Intermediate points on a great circle").
 */
export function positionAlongGreatCircle(from: LatLon, to: LatLon, share: number): LatLon {
  assertInRange('share', share, 0, 1);
  const rad = Math.PI / 180;
  const [lat1, lon1, lat2, lon2] = [from.lat * rad, from.lon * rad, to.lat * rad, to.lon * rad];
  const d =
    2 *
    Math.asin(
      Math.sqrt(
        Math.sin((lat2 - lat1) / 2) ** 2 +
          Math.cos(lat1) * Math.cos(lat2) * Math.sin((lon2 - lon1) / 2) ** 2,
      ),
    );
  if (d === 0 || share === 0) return { lat: from.lat, lon: from.lon };
  if (share === 1) return { lat: to.lat, lon: to.lon };
  const a = Math.sin((1 - share) * d) / Math.sin(d);
  const b = Math.sin(share * d) / Math.sin(d);
  const x = a * Math.cos(lat1) * Math.cos(lon1) + b * Math.cos(lat2) * Math.cos(lon2);
  const y = a * Math.cos(lat1) * Math.sin(lon1) + b * Math.cos(lat2) * Math.sin(lon2);
  const z = a * Math.sin(lat1) + b * Math.sin(lat2);
  return { lat: Math.atan2(z, Math.hypot(x, y)) / rad, lon: Math.atan2(y, x) / rad };
}
