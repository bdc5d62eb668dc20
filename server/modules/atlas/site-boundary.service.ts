import type { DataSource } from 'typeorm';
import { booleanPointInPolygon, pointOnFeature } from '@turf/turf';
import type { FeatureCollection, Point, Polygon } from 'geojson';
import { AppError } from '../../errors/app-error';
import type { Actor } from '../../middleware/authorise';
import { computeSitePlan } from '../../../shared/domain/site-plan';
import { boundaryAreaHa } from '../../../shared/domain/site-boundary';
import { haToAcres } from '../../../shared/domain/units';
import { sites } from '../sites/sites.service';
import type { Site } from '../sites/site.entity';
import type { BoundaryUploadRequest, DropMoveRequest } from './atlas.schemas';
import type { SiteBoundaryResult } from '../../../shared/schemas/atlas';
import { polygonFromGeoJsonText } from './boundary-file';

/** A site's boundary from a file, and its drops: the site plan redone and saved with the site. */
export class SiteBoundaryService {
  constructor(private readonly db: DataSource) {}

  /**
   * Reads the file's polygon, plans colonies, pallets and drops for the site's crop and saves
   * boundary, area, point and drops at the version the client read (409 when stale). A honey
   * location has no stocking rate: it keeps its boundary and area, with no drops.
   */
  async upload(
    actor: Actor,
    id: string,
    input: BoundaryUploadRequest,
  ): Promise<SiteBoundaryResult> {
    const boundary = polygonFromGeoJsonText(input.text);
    return this.db.transaction(async (tx) => {
      const site = await sites.get(tx, actor.operationId, id);
      const plan = planFor(site.crop, boundary, input.coloniesPerPallet, input.palletsPerDrop);
      const [longitude, latitude] = pointOnFeature(boundary).geometry.coordinates;
      const saved = await sites.update(tx, actor.operationId, id, input.version, {
        boundary,
        areaHa: plan.areaHa,
        latitude,
        longitude,
        drops: plan.drops,
      } as Partial<Site>);
      return present(saved, plan);
    });
  }

  /** Moves one drop point to a new place inside the boundary. */
  async moveDrop(actor: Actor, id: string, input: DropMoveRequest): Promise<SiteBoundaryResult> {
    return this.db.transaction(async (tx) => {
      const site = await sites.get(tx, actor.operationId, id);
      if (!site.boundary || !site.drops)
        throw AppError.validation([{ field: 'drop', message: 'This site has no drops yet.' }]);
      const index = site.drops.features.findIndex(
        (f) => Number((f.properties as { drop?: number } | null)?.drop) === input.drop,
      );
      if (index < 0)
        throw AppError.validation([{ field: 'drop', message: `No drop ${input.drop} here.` }]);
      const position: [number, number] = [input.longitude, input.latitude];
      if (!booleanPointInPolygon(position, site.boundary))
        throw AppError.validation([
          { field: 'latitude', message: 'Place the drop inside the boundary.' },
          { field: 'longitude', message: 'Place the drop inside the boundary.' },
        ]);
      const drops: FeatureCollection<Point> = {
        ...site.drops,
        features: site.drops.features.map((f, i) =>
          i === index ? { ...f, geometry: { type: 'Point', coordinates: position } } : f,
        ),
      };
      const saved = await sites.update(tx, actor.operationId, id, input.version, {
        drops,
      } as Partial<Site>);
      const areaHa = saved.areaHa ?? boundaryAreaHa(site.boundary);
      return present(saved, {
        areaHa,
        areaAcres: haToAcres(areaHa),
        hivesPerAcre: null,
        colonies: dropsTotal(drops),
        pallets: null,
        drops,
      });
    });
  }
}

interface PlanSummary {
  areaHa: number;
  areaAcres: number;
  hivesPerAcre: number | null;
  colonies: number | null;
  pallets: number | null;
  drops: FeatureCollection<Point> | null;
}

function planFor(
  crop: string,
  boundary: Polygon,
  coloniesPerPallet: number,
  palletsPerDrop: number,
): PlanSummary {
  try {
    return computeSitePlan({ crop, boundary, coloniesPerPallet, palletsPerDrop });
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    // No stocking rate (a honey location): area only.
    const areaHa = boundaryAreaHa(boundary);
    return {
      areaHa,
      areaAcres: haToAcres(areaHa),
      hivesPerAcre: null,
      colonies: null,
      pallets: null,
      drops: null,
    };
  }
}

const dropsTotal = (drops: FeatureCollection<Point>) =>
  drops.features.reduce(
    (sum, f) => sum + Number((f.properties as { colonies?: number } | null)?.colonies ?? 0),
    0,
  );

function present(site: Site, plan: PlanSummary): SiteBoundaryResult {
  return {
    id: site.id,
    version: site.version,
    boundary: site.boundary,
    latitude: site.latitude,
    longitude: site.longitude,
    areaHa: site.areaHa,
    drops: site.drops,
    plan: {
      areaHa: plan.areaHa,
      areaAcres: plan.areaAcres,
      hivesPerAcre: plan.hivesPerAcre,
      colonies: plan.colonies,
      pallets: plan.pallets,
      dropCount: plan.drops?.features.length ?? 0,
    },
  };
}
