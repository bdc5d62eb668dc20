import { In, IsNull, type DataSource } from 'typeorm';
import { addDays, format, parseISO } from 'date-fns';
import { distance } from '@turf/turf';
import type { Feature, LineString, MultiLineString, Point, Polygon, Position } from 'geojson';
import type { Actor } from '../../middleware/authorise';
import { Contract } from '../contracts/contract.entity';
import { Grower } from '../growers/grower.entity';
import { LedgerRepository } from '../ledger/ledger.repository';
import { today } from '../ledger/ledger.service';
import { Move } from '../moves/move.entity';
import { MoveOrigin } from '../moves/move-origin.entity';
import { Site } from '../sites/site.entity';
import { SprayNotice } from '../spray-notices/spray-notice.entity';
import { Yard } from '../yards/yard.entity';
import type {
  AtlasContract,
  AtlasDropProperties,
  AtlasLotCount,
  AtlasMoveProperties,
  AtlasNextMove,
  AtlasSiteProperties,
  AtlasSprayNoticeProperties,
  AtlasSummary,
  AtlasYardProperties,
} from '../../../shared/schemas/atlas';

/** Moves shown around the date: a week back, a month ahead (plus any still on the road). */
export const movesBeforeDays = 7;
export const movesAfterDays = 30;

/** Contract statuses that no longer bind anyone, shown only when nothing else applies. */
const lapsed = new Set(['turned-down', 'withdrawn']);

const shiftDate = (on: string, days: number) => format(addDays(parseISO(on), days), 'yyyy-MM-dd');

/** The Atlas: where the operation's colonies, places and moves are on one date. */
export class AtlasService {
  private readonly ledger = new LedgerRepository();

  constructor(private readonly db: DataSource) {}

  /** Yards, sites, drops, moves and spray notices of the actor's operation on `on`. */
  async summary(actor: Actor, on = today(), reachKm = 6): Promise<AtlasSummary> {
    const operationId = actor.operationId;
    const live = { operationId, archivedAt: IsNull() };
    const from = shiftDate(on, -movesBeforeDays);
    const to = shiftDate(on, movesAfterDays);
    const [yards, sites, growers, contracts, counts, moves, notices] = await Promise.all([
      this.db.getRepository(Yard).find({ where: live, order: { name: 'ASC' } }),
      this.db.getRepository(Site).find({ where: live, order: { name: 'ASC' } }),
      this.db.getRepository(Grower).find({ where: live, order: { name: 'ASC' } }),
      this.db.getRepository(Contract).find({ where: live }),
      this.ledger.countsOn(this.db, operationId, on),
      this.db
        .getRepository(Move)
        .createQueryBuilder('move')
        .where('move.operationId = :operationId AND move.archivedAt IS NULL', { operationId })
        .andWhere("move.status <> 'cancelled'")
        .andWhere(
          "((move.nightOf BETWEEN :from AND :to) OR move.status IN ('loading', 'rolling'))",
          { from, to },
        )
        .orderBy('move.nightOf', 'ASC')
        .getMany(),
      this.db
        .getRepository(SprayNotice)
        .createQueryBuilder('notice')
        .where('notice.operationId = :operationId AND notice.archivedAt IS NULL', { operationId })
        .andWhere('notice.endsAt >= :dayStart AND notice.startsAt < :dayEnd', {
          dayStart: `${on}T00:00:00Z`,
          // The day and the two after it: 48 hours' notice before a spray is common.
          dayEnd: `${shiftDate(on, 3)}T00:00:00Z`,
        })
        .getMany(),
    ]);
    const origins = moves.length
      ? await this.db
          .getRepository(MoveOrigin)
          .find({ where: { operationId, moveId: In(moves.map((m) => m.id)) } })
      : [];

    const lotsAt = new Map<string, AtlasLotCount[]>();
    for (const c of counts) {
      const key = `${c.placeKind}:${c.placeId}`;
      lotsAt.set(key, [
        ...(lotsAt.get(key) ?? []),
        {
          lotId: c.lotId,
          lotName: c.lotName,
          hiveSetupName: c.hiveSetupName,
          colonies: c.colonies,
        },
      ]);
    }
    const coloniesAt = (key: string) =>
      (lotsAt.get(key) ?? []).reduce((sum, lot) => sum + lot.colonies, 0);

    const originsOf = new Map<string, MoveOrigin[]>();
    for (const o of origins) originsOf.set(o.moveId, [...(originsOf.get(o.moveId) ?? []), o]);
    const nextMoveOf = (kind: 'yard' | 'site', id: string): AtlasNextMove | null => {
      for (const move of moves) {
        if (move.nightOf < on || move.status === 'closed' || move.status === 'placed') continue;
        const out = kind === 'yard' && (originsOf.get(move.id) ?? []).some((o) => o.yardId === id);
        const inbound = move.destinationKind === kind && move.destinationIds.includes(id);
        if (out || inbound)
          return {
            id: move.id,
            name: move.name,
            nightOf: move.nightOf,
            status: move.status,
            direction: out ? 'out' : 'in',
          };
      }
      return null;
    };

    const growerName = new Map(growers.map((g) => [g.id, g.name]));
    const yardPoint = new Map<string, Position>(
      yards.map((y) => [y.id, [y.longitude, y.latitude]]),
    );
    const sitePoint = new Map<string, Position>(
      sites.map((s) => [s.id, [s.longitude, s.latitude]]),
    );

    const yardFeatures: Feature<Point, AtlasYardProperties>[] = yards.map((yard) => ({
      type: 'Feature',
      id: yard.id,
      geometry: { type: 'Point', coordinates: [yard.longitude, yard.latitude] },
      properties: {
        id: yard.id,
        name: yard.name,
        capacity: yard.capacity,
        colonies: coloniesAt(`yard:${yard.id}`),
        lots: lotsAt.get(`yard:${yard.id}`) ?? [],
        lastVisitOn: yard.lastVisitOn,
        nextMove: nextMoveOf('yard', yard.id),
      },
    }));

    const siteFeatures: Feature<Polygon | Point, AtlasSiteProperties>[] = sites.map((site) => {
      const contract = governingContract(
        contracts.filter((c) => c.siteIds.includes(site.id)),
        on,
        actor.role === 'crew',
      );
      return {
        type: 'Feature',
        id: site.id,
        geometry: site.boundary ?? { type: 'Point', coordinates: [site.longitude, site.latitude] },
        properties: {
          id: site.id,
          name: site.name,
          kind: site.kind,
          crop: site.crop,
          growerId: site.growerId,
          growerName: site.growerId ? (growerName.get(site.growerId) ?? null) : null,
          latitude: site.latitude,
          longitude: site.longitude,
          areaHa: site.areaHa,
          hasBoundary: site.boundary !== null,
          bloomStartOn: site.bloomStartOn,
          bloomEndOn: site.bloomEndOn,
          colonies: coloniesAt(`site:${site.id}`),
          lots: lotsAt.get(`site:${site.id}`) ?? [],
          dropCount: site.drops?.features.length ?? 0,
          contract,
          contractState: contract?.status ?? 'none',
          nextMove: nextMoveOf('site', site.id),
          version: site.version,
        },
      };
    });

    const dropFeatures: Feature<Point, AtlasDropProperties>[] = sites.flatMap((site) =>
      (site.drops?.features ?? []).map((drop) => {
        const props = (drop.properties ?? {}) as Partial<AtlasDropProperties>;
        return {
          type: 'Feature' as const,
          geometry: drop.geometry,
          properties: {
            siteId: site.id,
            siteName: site.name,
            drop: Number(props.drop ?? 0),
            pallets: Number(props.pallets ?? 0),
            colonies: Number(props.colonies ?? 0),
          },
        };
      }),
    );

    const moveFeatures: Feature<LineString | MultiLineString, AtlasMoveProperties>[] =
      moves.flatMap((move) => {
        const moveOrigins = originsOf.get(move.id) ?? [];
        const originYardIds = [...new Set(moveOrigins.map((o) => o.yardId))];
        const destinations = move.destinationIds
          .map((id) => (move.destinationKind === 'yard' ? yardPoint : sitePoint).get(id))
          .filter((p): p is Position => Boolean(p));
        const lines = originYardIds
          .map((id) => yardPoint.get(id))
          .filter((p): p is Position => Boolean(p))
          .flatMap((origin) => destinations.map((destination) => [origin, destination]));
        if (lines.length === 0) return [];
        return [
          {
            type: 'Feature' as const,
            id: move.id,
            geometry:
              lines.length === 1
                ? { type: 'LineString' as const, coordinates: lines[0] }
                : { type: 'MultiLineString' as const, coordinates: lines },
            properties: {
              id: move.id,
              name: move.name,
              nightOf: move.nightOf,
              status: move.status,
              colonies: moveOrigins.reduce((sum, o) => sum + o.colonies, 0),
              originYardIds,
              destinationKind: move.destinationKind,
              destinationIds: move.destinationIds,
              timing: move.nightOf < on ? 'past' : move.nightOf === on ? 'tonight' : 'upcoming',
            },
          },
        ];
      });

    const siteById = new Map(sites.map((s) => [s.id, s]));
    const noticeFeatures: Feature<Point, AtlasSprayNoticeProperties>[] = notices.flatMap(
      (notice) => {
        const site = siteById.get(notice.siteId);
        if (!site) return [];
        const centre: Position = [site.longitude, site.latitude];
        const within = <T extends { id: string; name: string }>(
          places: T[],
          point: (p: T) => Position,
        ) =>
          places
            .map((p) => ({
              id: p.id,
              name: p.name,
              distanceKm: Math.round(distance(centre, point(p), { units: 'kilometers' }) * 10) / 10,
            }))
            .filter((p) => p.id !== site.id && p.distanceKm <= reachKm)
            .sort((a, b) => a.distanceKm - b.distanceKm);
        return [
          {
            type: 'Feature' as const,
            id: notice.id,
            geometry: { type: 'Point' as const, coordinates: centre },
            properties: {
              id: notice.id,
              siteId: site.id,
              siteName: site.name,
              product: notice.product,
              startsAt: notice.startsAt.toISOString(),
              endsAt: notice.endsAt.toISOString(),
              status: notice.status,
              yardsInReach: within(yards, (y) => [y.longitude, y.latitude]),
              sitesInReach: within(sites, (s) => [s.longitude, s.latitude]),
              reachKm,
            },
          },
        ];
      },
    );

    return {
      on,
      movesWindow: { from, to },
      yards: { type: 'FeatureCollection', features: yardFeatures },
      sites: { type: 'FeatureCollection', features: siteFeatures },
      drops: { type: 'FeatureCollection', features: dropFeatures },
      moves: { type: 'FeatureCollection', features: moveFeatures },
      sprayNotices: { type: 'FeatureCollection', features: noticeFeatures },
      growers: growers.map((g) => ({
        id: g.id,
        name: g.name,
        siteIds: sites.filter((s) => s.growerId === g.id).map((s) => s.id),
      })),
      totalColonies: counts.reduce((sum, c) => sum + c.colonies, 0),
    };
  }
}

/**
 * The contract to show for a site on a date: one whose delivery-to-removal span holds the date;
 * else the next to start; else the most recent. Lapsed (turned-down, withdrawn) contracts only
 * when there is no other. Crew get no prices.
 */
export function governingContract(
  candidates: Contract[],
  on: string,
  hidePrices: boolean,
): AtlasContract | null {
  const endOf = (c: Contract) => c.removalOn ?? c.deliveryEndOn;
  const rank = (c: Contract) => {
    const lapse = lapsed.has(c.status) ? 3 : 0;
    if (c.deliveryStartOn <= on && on <= endOf(c)) return lapse;
    if (c.deliveryStartOn > on) return lapse + 1;
    return lapse + 2;
  };
  const best = [...candidates].sort((a, b) => {
    const byRank = rank(a) - rank(b);
    if (byRank !== 0) return byRank;
    // Upcoming: soonest first; past: latest first.
    return rank(a) % 3 === 1
      ? a.deliveryStartOn.localeCompare(b.deliveryStartOn)
      : b.deliveryStartOn.localeCompare(a.deliveryStartOn);
  })[0];
  if (!best) return null;
  return {
    id: best.id,
    status: best.status,
    season: best.season,
    coloniesOrdered: best.coloniesOrdered,
    minFrames: best.minFrames,
    deliveryStartOn: best.deliveryStartOn,
    deliveryEndOn: best.deliveryEndOn,
    removalOn: best.removalOn,
    ...(hidePrices ? {} : { feePerColonyCents: best.feePerColonyCents }),
  };
}
