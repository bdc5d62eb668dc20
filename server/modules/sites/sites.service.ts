import type { DataSource, EntityManager } from 'typeorm';
import { area, pointOnFeature } from '@turf/turf';
import type { Polygon } from 'geojson';
import type { z } from 'zod';
import { TenantRepository } from '../../db/tenant-repository';
import { AppError } from '../../errors/app-error';
import { isoOrNull } from '../../http/present';
import type { Actor } from '../../middleware/authorise';
import type {
  SiteCreateRequest,
  SiteUpdateRequest,
  siteListQuery,
} from '../../../shared/schemas/sites';
import { growers } from '../growers/growers.service';
import { Site } from './site.entity';

export const sites = new TenantRepository(Site, 'Site');

function present(site: Site, actor: Actor) {
  const internal =
    actor.role === 'grower' ? {} : { accessNotes: site.accessNotes, notes: site.notes };
  return {
    id: site.id,
    growerId: site.growerId,
    name: site.name,
    kind: site.kind,
    crop: site.crop,
    boundary: site.boundary,
    latitude: site.latitude,
    longitude: site.longitude,
    areaHa: site.areaHa,
    bloomStartOn: site.bloomStartOn,
    bloomEndOn: site.bloomEndOn,
    drops: site.drops,
    ...internal,
    version: site.version,
    archivedAt: isoOrNull(site.archivedAt),
  };
}

/** Area and a point inside the block, derived from its boundary (geodesic area by turf). */
function fromBoundary(boundary: Polygon) {
  const [longitude, latitude] = pointOnFeature(boundary).geometry.coordinates;
  return { areaHa: area(boundary) / 10_000, latitude, longitude };
}

/** Orchard blocks, seed fields and honey locations; a grower sees only their own. */
export class SitesService {
  constructor(private readonly db: DataSource) {}

  private async checkGrower(tx: EntityManager, actor: Actor, growerId: string | null | undefined) {
    if (!growerId) return;
    await growers.get(tx, actor.operationId, growerId).catch(() => {
      throw AppError.validation([{ field: 'growerId', message: 'No such grower.' }]);
    });
  }

  async list(actor: Actor, query: z.infer<typeof siteListQuery>) {
    const page = await sites.list(this.db, actor.operationId, query, (qb) => {
      if (actor.role === 'grower') qb.andWhere('record.growerId = :own', { own: actor.growerId });
      if (query.growerId) qb.andWhere('record.growerId = :growerId', { growerId: query.growerId });
      if (query.crop) qb.andWhere('record.crop = :crop', { crop: query.crop });
      if (query.kind) qb.andWhere('record.kind = :kind', { kind: query.kind });
      if (query.q)
        qb.andWhere('record.name ILIKE :q', { q: `%${query.q.replace(/[%_\\]/g, '\\$&')}%` });
    });
    return { items: page.items.map((s) => present(s, actor)), total: page.total };
  }

  async get(actor: Actor, id: string) {
    const site = await sites.get(this.db, actor.operationId, id);
    if (actor.role === 'grower' && site.growerId !== actor.growerId)
      throw AppError.notFound('Site');
    return present(site, actor);
  }

  async create(actor: Actor, input: SiteCreateRequest) {
    const site = await this.db.transaction(async (tx) => {
      await this.checkGrower(tx, actor, input.growerId);
      const derived = input.boundary ? fromBoundary(input.boundary) : {};
      return sites.insert(tx, actor.operationId, { ...input, ...derived } as Partial<Site>);
    });
    return present(site, actor);
  }

  async update(actor: Actor, id: string, { version, ...changes }: SiteUpdateRequest) {
    const site = await this.db.transaction(async (tx) => {
      await this.checkGrower(tx, actor, changes.growerId);
      const derived = changes.boundary
        ? fromBoundary(changes.boundary)
        : changes.boundary === null
          ? { areaHa: null }
          : {};
      return sites.update(tx, actor.operationId, id, version, {
        ...changes,
        ...derived,
      } as Partial<Site>);
    });
    return present(site, actor);
  }

  async archive(actor: Actor, id: string, version: number) {
    return present(
      await this.db.transaction((tx) => sites.archive(tx, actor.operationId, id, version)),
      actor,
    );
  }
}
