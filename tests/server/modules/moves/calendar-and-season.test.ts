import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../../support/test-app';
import { createUser, testPassword } from '../../../support/factories';
import { createMoveWorld, moneyKeys, twoYardMove, type MoveWorld } from './move-world';

let t: TestApp;
let w: MoveWorld;
let owner: Client;
let planner: Client;
let crew: Client;
let grower: Client;

beforeAll(async () => {
  t = await startTestApp();
  w = await createMoveWorld(t.db);
  owner = await signedInClient(t.app, w.owner.email, testPassword);
  planner = await signedInClient(t.app, w.planner.email, testPassword);
  crew = await signedInClient(t.app, w.crew.email, testPassword);
  grower = await signedInClient(t.app, w.growerUserA.email, testPassword);
  // Three moves: one planned, one cancelled, one still a draft (crew never see drafts).
  const create = async (nightOf: string, colonies: number) =>
    (
      await planner
        .post(
          '/api/moves',
          twoYardMove(w, {
            name: `Almond run ${nightOf}`,
            nightOf,
            origins: [{ yardId: w.yardA, lotId: w.weighedLot, colonies }],
          }),
        )
        .expect(201)
    ).body;
  const planned = await create('2027-01-26', 40);
  await planner
    .post(`/api/moves/${planned.id}/status`, { version: 1, status: 'planned' })
    .expect(200);
  const cancelled = await create('2027-01-27', 20);
  await planner
    .post(`/api/moves/${cancelled.id}/status`, { version: 1, status: 'cancelled' })
    .expect(200);
  await create('2027-01-28', 10);
});
afterAll(() => t.close());

const events = (ics: string) => ics.match(/^BEGIN:VEVENT\r$/gm)?.length ?? 0;
const fetchFeed = (path: string) => supertest(t.app).get(path);

describe('calendar feeds', () => {
  it('when crew make a feed then it is a valid calendar of their moves, without money or gate codes', async () => {
    const before = await crew.get('/api/calendar-feeds/me').expect(200);
    expect(before.body).toMatchObject({ exists: false, url: null });
    const made = await crew.post('/api/calendar-feeds/me/rotate').expect(200);
    expect(made.body.path).toMatch(/^\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    expect(made.body.url).toMatch(/^http:\/\/.+\/calendar\/.+\.ics$/);

    const feed = await fetchFeed(made.body.path).expect(200);
    expect(feed.headers['content-type']).toMatch(/^text\/calendar/);
    expect(feed.headers['cache-control']).toMatch(/no-store/);
    const ics = feed.text;
    expect(ics.startsWith('BEGIN:VCALENDAR\r\n')).toBe(true);
    expect(ics.trimEnd().endsWith('END:VCALENDAR')).toBe(true);
    expect(ics).toMatch(/^VERSION:2\.0\r$/m);
    expect(ics).toMatch(/^PRODID:/m);
    expect(events(ics)).toBe(2); // planned + cancelled; the draft is not for crew
    expect(ics).toMatch(/^STATUS:CANCELLED\r$/m);
    expect(ics.match(/^UID:move-[0-9a-f-]+@duskhaul\r$/gm)).toHaveLength(2);
    expect(ics.match(/^DTSTAMP:\d{8}T\d{6}Z\r$/gm)).toHaveLength(2);
    // Departure → arrival from the saved timeline, in UTC.
    expect(ics).toMatch(/^DTSTART:202701\d\dT\d{6}Z\r$/m);
    expect(ics).toMatch(/^DTEND:202701\d\dT\d{6}Z\r$/m);
    expect(ics).toMatch(/^SUMMARY:You drive: Almond run 2027-01-26\r$/m);
    expect(ics).toMatch(/^LOCATION:Block 12 North\r$/m);
    expect(ics).toMatch(/40 colonies/);
    // No gate code (yard A's access note) and no fee (19400 cents) anywhere in it.
    const unfolded = ics.replace(/\r\n[ \t]/g, '');
    expect(unfolded).not.toMatch(/Gate code 4471|east gate|\bcents\b|\bfee\b|\$/i);

    const after = await crew.get('/api/calendar-feeds/me').expect(200);
    expect(after.body.exists).toBe(true);
    expect(after.body.lastUsedAt).not.toBeNull();
  });

  it('when planners open their feed then drafts appear as tentative', async () => {
    const made = await planner.post('/api/calendar-feeds/me/rotate').expect(200);
    const ics = (await fetchFeed(made.body.path).expect(200)).text;
    expect(events(ics)).toBe(3);
    expect(ics).toMatch(/^STATUS:TENTATIVE\r$/m);
  });

  it('when the token is rotated then the old URL is 404 and the new one works', async () => {
    const first = (await owner.post('/api/calendar-feeds/me/rotate').expect(200)).body.path;
    await fetchFeed(first).expect(200);
    const second = (await owner.post('/api/calendar-feeds/me/rotate').expect(200)).body.path;
    expect(second).not.toBe(first);
    const gone = await fetchFeed(first).expect(404);
    expect(gone.body.error.code).toBe('not_found');
    await fetchFeed(second).expect(200);
    await fetchFeed('/calendar/not-a-token.ics').expect(404);
    await fetchFeed(`/calendar/${'A'.repeat(43)}.ics`).expect(404);
  });

  it('when a user is deactivated then their feed is 404; growers get 403', async () => {
    const hand = await createUser(t.db, w.operationId, 'crew');
    const client = await signedInClient(t.app, hand.email, testPassword);
    const path = (await client.post('/api/calendar-feeds/me/rotate').expect(200)).body.path;
    await fetchFeed(path).expect(200);
    await t.db.query(`UPDATE users SET active = false WHERE id = $1`, [hand.id]);
    await fetchFeed(path).expect(404);
    await grower.get('/api/calendar-feeds/me').expect(403);
    await grower.post('/api/calendar-feeds/me/rotate').expect(403);
  });
});

describe('GET /api/season', () => {
  it('when the board covers late January to mid-March then it lists ISO weeks, the contract, the moves and the balance', async () => {
    await t.db.query(`UPDATE contracts SET status = 'agreed' WHERE id = $1`, [w.contract]);
    const { body } = await owner.get('/api/season?from=2027-01-18&to=2027-03-14').expect(200);
    expect(body.weeks.map((x: { week: string }) => x.week)).toEqual([
      '2027-W03',
      '2027-W04',
      '2027-W05',
      '2027-W06',
      '2027-W07',
      '2027-W08',
      '2027-W09',
      '2027-W10',
    ]);
    expect(body.weeks[0]).toEqual({
      week: '2027-W03',
      weekStart: '2027-01-18',
      weekEnd: '2027-01-24',
    });
    const [contract] = body.contracts;
    expect(contract).toMatchObject({
      id: w.contract,
      status: 'agreed',
      feePerColonyCents: 19400,
      deliveryWeeks: ['2027-W05', '2027-W06'],
    });
    expect(body.moves.map((m: { week: string }) => m.week)).toEqual([
      '2027-W04',
      '2027-W04',
      '2027-W04',
    ]);
    // 450 colonies on hand (300 + 150), 400 needed from W05 to W10; by strength the lot means
    // (8 frames each, the factory's) meet the 6-frame minimum.
    const week5 = body.balance.find((b: { week: string }) => b.week === '2027-W05');
    expect(week5).toMatchObject({ coloniesNeeded: 400, coloniesAvailable: 450, covered: true });
    expect(week5.byStrength).toEqual([
      { minFramesOfBees: 6, needed: 400, available: 450, shortfall: 0 },
    ]);
    expect(body.balance.find((b: { week: string }) => b.week === '2027-W04').coloniesNeeded).toBe(
      0,
    );
  });

  it('when crew read the board then no money is in it; growers get 403; a backwards period is 400', async () => {
    const { body } = await crew.get('/api/season?from=2027-01-18&to=2027-03-14').expect(200);
    expect(moneyKeys(body)).toEqual([]);
    await grower.get('/api/season?from=2027-01-18&to=2027-03-14').expect(403);
    const refused = await owner.get('/api/season?from=2027-03-14&to=2027-01-18').expect(400);
    expect(refused.body.error.details[0].field).toBe('to');
  });
});
