import { createHash, randomBytes } from 'node:crypto';
import { Router, type Request } from 'express';
import { createEvents, type EventAttributes } from 'ics';
import type { DataSource } from 'typeorm';
import { addDays } from '../../../shared/domain/calendar-date';
import { AppError } from '../../errors/app-error';
import { actorOf, allow, staff, type Actor } from '../../middleware/authorise';
import { today } from '../ledger/ledger.service';

/**
 * Each staff user's secret iCalendar (RFC 5545) feed of the operation's moves, for phone
 * calendars. The URL carries a 256-bit random token; only its SHA-256 is stored, so the URL is
 * shown once, when it is made, and rotating it makes a new one and kills the old.
 */

const newToken = () => randomBytes(32).toString('base64url');
const digest = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');
const wellFormed = (token: string) => /^[A-Za-z0-9_-]{43}$/.test(token);
const feedPath = (token: string) => `/calendar/${token}.ics`;

/** Moves from this many days back appear in the feed (and every later one). */
export const FEED_DAYS_BACK = 60;
/** At most this many moves per feed. */
export const FEED_MAX_EVENTS = 500;

/** `/api/calendar-feeds`: see whether one's feed exists, and make or rotate it (staff only). */
export function calendarFeedsRouter(db: DataSource) {
  const router = Router();
  router.get('/me', allow(...staff), async (req, res) => {
    const actor = actorOf(req);
    const [feed] = (await db.query(
      `SELECT created_at, last_used_at FROM calendar_feeds WHERE operation_id = $1 AND user_id = $2`,
      [actor.operationId, actor.id],
    )) as Array<{ created_at: Date; last_used_at: Date | null }>;
    res.json({
      exists: Boolean(feed),
      createdAt: feed?.created_at.toISOString() ?? null,
      lastUsedAt: feed?.last_used_at?.toISOString() ?? null,
      // The URL itself is shown only when made: the server keeps no copy of the token.
      url: null,
    });
  });
  router.post('/me/rotate', allow(...staff), async (req, res) => {
    const actor = actorOf(req);
    const token = newToken();
    await db.query(
      `INSERT INTO calendar_feeds (operation_id, user_id, token_sha256) VALUES ($1, $2, $3)
       ON CONFLICT (operation_id, user_id)
       DO UPDATE SET token_sha256 = EXCLUDED.token_sha256, created_at = now(), last_used_at = NULL`,
      [actor.operationId, actor.id, digest(token)],
    );
    res.set('Cache-Control', 'no-store');
    res.json({ exists: true, path: feedPath(token), url: absolute(req, feedPath(token)) });
  });
  return router;
}

function absolute(req: Request, path: string): string {
  return `${req.protocol}://${req.get('host') ?? 'localhost'}${path}`;
}

/** `/calendar/:token.ics`: no session; an unknown, rotated or revoked token is a 404. */
export function calendarFileRouter(db: DataSource) {
  const router = Router();
  router.get('/:token.ics', async (req, res) => {
    res.set('Referrer-Policy', 'no-referrer');
    const token = String(req.params.token);
    if (!wellFormed(token)) throw AppError.notFound('Calendar');
    const [owner] = (await db.query(
      `UPDATE calendar_feeds f SET last_used_at = now()
         FROM users u JOIN operations o ON o.id = u.operation_id
        WHERE f.token_sha256 = $1 AND u.id = f.user_id AND u.operation_id = f.operation_id
          AND u.active AND u.role <> 'grower'
        RETURNING u.id, u.name, u.role, u.operation_id AS "operationId", o.name AS "operationName"`,
      [digest(token)],
    )) as [Array<Pick<Actor, 'id' | 'name' | 'role' | 'operationId' | 'operationName'>>, number];
    const user = owner[0];
    if (!user) throw AppError.notFound('Calendar');
    const body = await calendarOf(db, user);
    res.set('Cache-Control', 'private, no-store');
    res.type('text/calendar; charset=utf-8').send(body);
  });
  return router;
}

interface MoveRow {
  id: string;
  name: string;
  night_of: string;
  status: string;
  timeline: {
    timeline?: {
      window?: {
        loadingStart: string;
        departure: string;
        arrival: string;
        destination?: { civilDawn: string | null };
      } | null;
      to?: { name: string } | null;
    };
    totals?: { pallets: number; loadedColonies: number };
  } | null;
  version: number;
  updated_at: Date;
  colonies: number;
  yards: string[] | null;
  destinations: string[] | null;
  drivers: string[] | null;
  trucks: number;
}

/**
 * The calendar of a user's operation's moves from FEED_DAYS_BACK days ago on. Owners and planners
 * see drafts too (as tentative); crew see every move from planned on, marked when their name is
 * among a load's drivers. Cancelled moves stay in the feed as cancelled so calendars drop them.
 * No money and no gate codes: a calendar is easily shared.
 */
export async function calendarOf(
  db: DataSource,
  user: Pick<Actor, 'id' | 'name' | 'role' | 'operationId' | 'operationName'>,
): Promise<string> {
  const statuses =
    user.role === 'crew'
      ? ['planned', 'loading', 'rolling', 'placed', 'closed', 'cancelled']
      : ['draft', 'planned', 'loading', 'rolling', 'placed', 'closed', 'cancelled'];
  const rows = (await db.query(
    `SELECT m.id, m.name, to_char(m.night_of, 'YYYY-MM-DD') AS night_of, m.status, m.timeline,
            m.version, m.updated_at,
            (SELECT COALESCE(SUM(o.colonies), 0)::int FROM move_origins o WHERE o.move_id = m.id) AS colonies,
            (SELECT array_agg(y.name ORDER BY o.pickup_order) FROM move_origins o JOIN yards y ON y.id = o.yard_id WHERE o.move_id = m.id) AS yards,
            (SELECT array_agg(COALESCE(s.name, y.name)) FROM unnest(m.destination_ids) d(id)
               LEFT JOIN sites s ON m.destination_kind = 'site' AND s.id = d.id
               LEFT JOIN yards y ON m.destination_kind = 'yard' AND y.id = d.id) AS destinations,
            (SELECT array_agg(n) FROM move_loads l, unnest(l.driver_names) n WHERE l.move_id = m.id) AS drivers,
            (SELECT count(*)::int FROM move_loads l WHERE l.move_id = m.id) AS trucks
       FROM moves m
      WHERE m.operation_id = $1 AND m.archived_at IS NULL AND m.status = ANY($2)
        AND m.night_of >= $3
      ORDER BY m.night_of, m.name
      LIMIT ${FEED_MAX_EVENTS}`,
    [user.operationId, statuses, addDays(today(), -FEED_DAYS_BACK)],
  )) as MoveRow[];

  const events: EventAttributes[] = rows.map((m) => {
    const window = m.timeline?.timeline?.window ?? null;
    const yours = (m.drivers ?? []).some(
      (d) => d.trim().toLowerCase() === user.name.trim().toLowerCase(),
    );
    const lines = [
      `${m.colonies} colonies on ${m.trucks} truck${m.trucks === 1 ? '' : 's'}` +
        (m.timeline?.totals ? ` (${m.timeline.totals.pallets} pallets planned)` : '') +
        '.',
      `Pick-up: ${(m.yards ?? []).join(' → ') || 'not set'}.`,
      `Drop: ${(m.destinations ?? []).join(', ') || 'not set'}.`,
      window
        ? `Loading from ${window.loadingStart}; rolling ${window.departure}; arriving ${window.arrival}` +
          (window.destination?.civilDawn ? `; civil dawn ${window.destination.civilDawn}.` : '.')
        : `Night of ${m.night_of}; times not computed yet.`,
      `Status: ${m.status}.`,
      'Gate codes and contacts are on the load sheet in Duskhaul.',
    ];
    const times: Pick<EventAttributes, 'start' | 'startInputType' | 'startOutputType'> &
      ({ end: EventAttributes['start'] } & Partial<EventAttributes>) = window
      ? {
          start: Date.parse(window.departure),
          startInputType: 'utc',
          startOutputType: 'utc',
          end: Date.parse(window.arrival),
          endInputType: 'utc',
          endOutputType: 'utc',
        }
      : { start: dateParts(m.night_of), end: dateParts(addDays(m.night_of, 1)) };
    return {
      uid: `move-${m.id}@duskhaul`,
      sequence: m.version,
      title: `${yours ? 'You drive: ' : ''}${m.name}`,
      description: lines.join('\n'),
      location: (m.destinations ?? []).join(', '),
      status:
        m.status === 'cancelled' ? 'CANCELLED' : m.status === 'draft' ? 'TENTATIVE' : 'CONFIRMED',
      lastModified: m.updated_at.getTime(),
      ...times,
    } as EventAttributes;
  });
  const { error, value } = createEvents(events, {
    productId: '-//Duskhaul//Moves//EN',
    calName: `Moves: ${user.operationName}`,
  });
  if (error || !value) throw error ?? new Error('could not build the calendar');
  return value;
}

function dateParts(date: string): [number, number, number] {
  const [y, m, d] = date.split('-').map(Number);
  return [y, m, d];
}
