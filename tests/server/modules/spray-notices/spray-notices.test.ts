import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, type Client } from '../../../support/test-app';
import { createCrew, createOperation, createUser, testPassword } from '../../../support/factories';
import { settledEmails, startMailTestApp, type MailTestApp } from '../emails/support';
import { sprayCaution } from '../../../../shared/schemas/spray-notices';

let t: MailTestApp;
let people: Awaited<ReturnType<typeof createCrew>>;
let c: Record<'planner' | 'crew' | 'growerA' | 'growerB' | 'otherOwner', Client>;
let siteA: string;
let siteB: string;

const site = async (growerId: string, name: string) =>
  (
    await t.db.query(
      `INSERT INTO sites (operation_id, grower_id, name, kind, crop, latitude, longitude)
       VALUES ($1, $2, $3, 'orchard', 'almond', 36.6, -120.3) RETURNING id`,
      [people.operationId, growerId, name],
    )
  )[0].id as string;

const notice = (siteId: string) => ({
  siteId,
  startsAt: '2027-02-20T05:30:00-08:00',
  endsAt: '2027-02-20T09:00:00-08:00',
  product: 'A fungicide (label name here)',
  notes: 'Blocks 3 and 4 only.',
});

beforeAll(async () => {
  t = await startMailTestApp();
  people = await createCrew(t.db);
  const other = await createOperation(t.db, 'Another operation');
  const otherOwner = await createUser(t.db, other, 'owner');
  siteA = await site(people.growerA, 'Block A');
  siteB = await site(people.growerB, 'Block B');
  c = {
    planner: await signedInClient(t.app, people.planner.email, testPassword),
    crew: await signedInClient(t.app, people.crew.email, testPassword),
    growerA: await signedInClient(t.app, people.growerUserA.email, testPassword),
    growerB: await signedInClient(t.app, people.growerUserB.email, testPassword),
    otherOwner: await signedInClient(t.app, otherOwner.email, testPassword),
  };
}, 60_000);
afterAll(() => t?.close());

describe('POST /api/spray-notices', () => {
  it('when grower A files a notice then the planners are e-mailed at once and staff see it', async () => {
    const filed = await c.growerA.post('/api/spray-notices', notice(siteA));
    expect(filed.status, JSON.stringify(filed.body)).toBe(201);
    expect(filed.body).toMatchObject({ siteId: siteA, growerId: people.growerA, status: 'filed' });
    expect(filed.body.caution).toBe(sprayCaution);
    expect(filed.body.actionNote).toBeUndefined();

    for (const to of [people.planner.email, people.owner.email]) {
      const mail = await t.fake.waitFor(
        (m) => m.to.includes(to) && m.subject.startsWith('Spray notice'),
      );
      expect(mail.text).toContain('Block A');
      expect(mail.text).toContain('2027-02-20 05:30 (UTC-08:00)');
      expect(mail.text).toContain('America/Los_Angeles');
      expect(mail.text).toContain('product label');
      expect(mail.html).toContain('A fungicide (label name here)');
    }
    const staffList = await c.crew.get('/api/spray-notices');
    expect(staffList.status).toBe(200);
    expect(staffList.body.items.map((n: { id: string }) => n.id)).toContain(filed.body.id);
    expect(staffList.body.caution).toBe(sprayCaution);
    const notes = await c.planner.get('/api/notifications?unread=true');
    expect(
      notes.body.items.some(
        (n: { kind: string; relatedId: string }) =>
          n.kind === 'spray-notice-filed' && n.relatedId === filed.body.id,
      ),
    ).toBe(true);
    const rows = await settledEmails(t.db, people.operationId);
    expect(rows.filter((r) => r.purpose === 'spray-notice').every((r) => r.status === 'sent')).toBe(
      true,
    );
  });

  it('when a grower names another grower’s site or bad times then it is refused with 400 and nothing is filed', async () => {
    const [{ count: before }] = await t.db.query(
      `SELECT count(*)::int AS count FROM spray_notices WHERE operation_id = $1`,
      [people.operationId],
    );
    const foreign = await c.growerB.post('/api/spray-notices', notice(siteA));
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.details[0].field).toBe('siteId');
    const noOffset = await c.growerA.post('/api/spray-notices', {
      ...notice(siteA),
      startsAt: '2027-02-20T05:30:00',
      endsAt: '2027-02-20T04:00:00-08:00',
    });
    expect(noOffset.status).toBe(400);
    expect(noOffset.body.error.details.map((d: { field: string }) => d.field)).toContain(
      'startsAt',
    );
    expect((await c.crew.post('/api/spray-notices', notice(siteA))).status).toBe(403);
    expect((await c.otherOwner.post('/api/spray-notices', notice(siteA))).status).toBe(400);
    const [{ count: after }] = await t.db.query(
      `SELECT count(*)::int AS count FROM spray_notices WHERE operation_id = $1`,
      [people.operationId],
    );
    expect(after).toBe(before);
  });
});

describe('GET /api/spray-notices', () => {
  it('when grower B lists or opens notices then grower A’s are invisible (empty list, 404)', async () => {
    const a = await c.growerA.post('/api/spray-notices', notice(siteA));
    const b = await c.growerB.post('/api/spray-notices', notice(siteB));
    expect(b.status).toBe(201);
    const listB = await c.growerB.get('/api/spray-notices');
    expect(listB.body.items.every((n: { growerId: string }) => n.growerId === people.growerB)).toBe(
      true,
    );
    expect((await c.growerB.get(`/api/spray-notices/${a.body.id}`)).status).toBe(404);
    expect((await c.otherOwner.get(`/api/spray-notices/${a.body.id}`)).status).toBe(404);
    expect((await c.otherOwner.get('/api/spray-notices')).body.items).toEqual([]);
    const own = await c.growerA.get(`/api/spray-notices/${a.body.id}`);
    expect(own.status).toBe(200);
    expect(own.body.caution).toBe(sprayCaution);
  });
});

describe('POST /api/spray-notices/:id/acknowledge', () => {
  it('when a planner acknowledges with the current version then the action is kept; a stale version gets 409', async () => {
    const filed = await c.growerA.post('/api/spray-notices', notice(siteA));
    const ack = await c.planner.post(`/api/spray-notices/${filed.body.id}/acknowledge`, {
      version: filed.body.version,
      action: 'cover',
      note: 'Cover drops 2–5 the night before.',
    });
    expect(ack.status).toBe(200);
    expect(ack.body).toMatchObject({
      status: 'acknowledged',
      action: 'cover',
      actionNote: 'Cover drops 2–5 the night before.',
      version: filed.body.version + 1,
      caution: sprayCaution,
    });
    const stale = await c.planner.post(`/api/spray-notices/${filed.body.id}/acknowledge`, {
      version: filed.body.version,
      action: 'move',
    });
    expect(stale.status).toBe(409);
    const bad = await c.planner.post(`/api/spray-notices/${filed.body.id}/acknowledge`, {
      version: ack.body.version,
      action: 'spray-anyway',
    });
    expect(bad.status).toBe(400);
    expect(
      (
        await c.growerA.post(`/api/spray-notices/${filed.body.id}/acknowledge`, {
          version: ack.body.version,
          action: 'move',
        })
      ).status,
    ).toBe(403);
    const seenByGrower = await c.growerA.get(`/api/spray-notices/${filed.body.id}`);
    expect(seenByGrower.body.action).toBe('cover');
    expect(seenByGrower.body.actionNote).toBeUndefined();
  });
});
