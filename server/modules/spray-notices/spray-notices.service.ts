import type { DataSource } from 'typeorm';
import type { z } from 'zod';
import type { Env } from '../../config/env';
import { TenantRepository } from '../../db/tenant-repository';
import { AppError } from '../../errors/app-error';
import { isoOrNull } from '../../http/present';
import type { Actor } from '../../middleware/authorise';
import { formatInstantInZone, timeZoneAt } from '../../../shared/domain/time-zones';
import {
  sprayCaution,
  type SprayNoticeAcknowledgeRequest,
  type SprayNoticeCreateRequest,
  type sprayNoticeListQuery,
} from '../../../shared/schemas/spray-notices';
import { plannerRecipients, queueEmail } from '../emails/email-outbox';
import type { JobQueue } from '../jobs/job-queue';
import { notifyPlanners } from '../notifications/notifications';
import { sites } from '../sites/sites.service';
import { sprayNoticeEmail } from './spray-notice-email';
import { SprayNotice } from './spray-notice.entity';

export const sprayNotices = new TenantRepository(SprayNotice, 'Spray notice');

export interface SprayNoticeDeps {
  db: DataSource;
  jobs: JobQueue;
  env: Pick<Env, 'APP_URL'>;
}

/** A notice as each role sees it: the beekeeper's note on the action stays internal. */
export function presentSprayNotice(n: SprayNotice, actor: Actor) {
  return {
    id: n.id,
    growerId: n.growerId,
    siteId: n.siteId,
    startsAt: n.startsAt.toISOString(),
    endsAt: n.endsAt.toISOString(),
    product: n.product,
    notes: n.notes,
    status: n.status,
    action: n.action,
    ...(actor.role === 'grower'
      ? {}
      : { actionNote: n.actionNote, acknowledgedBy: n.acknowledgedBy }),
    acknowledgedAt: isoOrNull(n.acknowledgedAt),
    version: n.version,
    archivedAt: isoOrNull(n.archivedAt),
    createdAt: n.createdAt.toISOString(),
    caution: sprayCaution,
  };
}

/**
 * Spray notices: a grower warns of a planned application at one of their sites; the planners
 * hear at once (e-mail and in the app) and acknowledge with what they will do.
 */
export class SprayNoticesService {
  constructor(private readonly deps: SprayNoticeDeps) {}

  private get db() {
    return this.deps.db;
  }

  /** A grower's own notice, or any of the operation's for staff; 404 otherwise. */
  private async visible(actor: Actor, id: string) {
    const notice = await sprayNotices.get(this.db, actor.operationId, id);
    if (actor.role === 'grower' && notice.growerId !== actor.growerId)
      throw AppError.notFound('Spray notice');
    return notice;
  }

  async list(actor: Actor, query: z.infer<typeof sprayNoticeListQuery>) {
    const page = await sprayNotices.list(
      this.db,
      actor.operationId,
      { ...query, sort: 'startsAt', order: 'asc' },
      (qb) => {
        if (actor.role === 'grower') qb.andWhere('record.growerId = :own', { own: actor.growerId });
        if (query.siteId) qb.andWhere('record.siteId = :siteId', { siteId: query.siteId });
        if (query.status) qb.andWhere('record.status = :status', { status: query.status });
        if (query.from) qb.andWhere('record.endsAt > :from', { from: query.from });
        if (query.to) qb.andWhere('record.startsAt < :to', { to: query.to });
      },
    );
    return {
      items: page.items.map((n) => presentSprayNotice(n, actor)),
      total: page.total,
      caution: sprayCaution,
    };
  }

  async get(actor: Actor, id: string) {
    return presentSprayNotice(await this.visible(actor, id), actor);
  }

  /** Files a notice (a grower for their own site; a planner on a grower's behalf). */
  async create(actor: Actor, input: SprayNoticeCreateRequest) {
    return this.db.transaction(async (tx) => {
      const site = await sites.get(tx, actor.operationId, input.siteId).catch(() => null);
      const usable =
        site &&
        !site.archivedAt &&
        site.growerId &&
        (actor.role !== 'grower' || site.growerId === actor.growerId);
      if (!site || !usable || !site.growerId)
        throw AppError.validation([
          {
            field: 'siteId',
            message:
              site && !site.growerId && actor.role !== 'grower'
                ? 'This site has no grower.'
                : 'No such site.',
          },
        ]);
      const notice = await sprayNotices.insert(tx, actor.operationId, {
        growerId: site.growerId,
        siteId: site.id,
        startsAt: new Date(input.startsAt),
        endsAt: new Date(input.endsAt),
        product: input.product,
        notes: input.notes ?? '',
        status: 'filed',
        filedBy: actor.id,
      });

      const [grower] = await tx.query(`SELECT name FROM growers WHERE id = $1`, [site.growerId]);
      const [contract] = await tx.query(
        `SELECT min(spray_notice_hours)::int AS hours FROM contracts
          WHERE operation_id = $1 AND $2 = ANY(site_ids) AND archived_at IS NULL
            AND status IN ('offered', 'agreed', 'in-bloom')`,
        [actor.operationId, site.id],
      );
      const timeZone = timeZoneAt(site.latitude, site.longitude);
      const facts = {
        growerName: grower.name as string,
        siteName: site.name,
        startsLocal: formatInstantInZone(notice.startsAt, timeZone),
        endsLocal: formatInstantInZone(notice.endsAt, timeZone),
        timeZone,
        product: notice.product,
        notes: notice.notes,
        hoursOfNotice: Math.max(
          0,
          Math.floor((notice.startsAt.getTime() - notice.createdAt.getTime()) / 3_600_000),
        ),
        agreedNoticeHours: (contract?.hours as number | null) ?? null,
      };
      await notifyPlanners(tx, actor.operationId, {
        kind: 'spray-notice-filed',
        title: `Spray notice: ${facts.growerName}, ${facts.siteName}`,
        body: `${facts.product} from ${facts.startsLocal} to ${facts.endsLocal}`,
        relatedKind: 'spray-notice',
        relatedId: notice.id,
      });
      const url = `${this.deps.env.APP_URL.replace(/\/+$/, '')}/spray-notices/${notice.id}`;
      for (const planner of await plannerRecipients(tx, actor.operationId))
        await queueEmail(
          tx,
          this.deps.jobs,
          {
            operationId: actor.operationId,
            purpose: 'spray-notice',
            relatedKind: 'spray-notice',
            relatedId: notice.id,
          },
          sprayNoticeEmail(planner.email, facts, url),
        );
      return presentSprayNotice(notice, actor);
    });
  }

  /** A planner acknowledges the notice and records the action (409 on a stale version). */
  async acknowledge(actor: Actor, id: string, input: SprayNoticeAcknowledgeRequest) {
    const notice = await this.db.transaction((tx) =>
      sprayNotices.update(tx, actor.operationId, id, input.version, {
        status: 'acknowledged',
        action: input.action,
        actionNote: input.note ?? '',
        acknowledgedBy: actor.id,
        acknowledgedAt: new Date(),
      }),
    );
    return presentSprayNotice(notice, actor);
  }

  /** Withdraws a notice: planners, or the grower who owns it. */
  async archive(actor: Actor, id: string, version: number) {
    await this.visible(actor, id);
    const notice = await this.db.transaction((tx) =>
      sprayNotices.archive(tx, actor.operationId, id, version),
    );
    return presentSprayNotice(notice, actor);
  }
}
