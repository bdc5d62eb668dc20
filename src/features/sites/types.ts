import type { FeatureCollection, Point, Polygon } from 'geojson';
import type { CropKey, SiteKind } from '@shared/schemas/sites';

/** A site as the API presents it; notes are absent for growers. */
export interface Site {
  id: string;
  growerId: string | null;
  name: string;
  kind: SiteKind;
  crop: CropKey;
  boundary: Polygon | null;
  latitude: number | null;
  longitude: number | null;
  areaHa: number | null;
  bloomStartOn: string | null;
  bloomEndOn: string | null;
  drops: FeatureCollection<Point> | null;
  accessNotes?: string;
  notes?: string;
  version: number;
  archivedAt: string | null;
}

export const siteKindLabels: Record<SiteKind, string> = {
  orchard: 'Orchard block',
  'seed-field': 'Seed field',
  honey: 'Honey location',
};
