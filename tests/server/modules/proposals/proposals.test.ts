import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, type Client } from '../../../support/test-app';
import { createCrew, testPassword } from '../../../support/factories';
import {
  linkAfter,
  pathOf,
  settledEmails,
  startMailTestApp,
  supertest,
  type MailTestApp,
} from '../emails/support';

let t: MailTestApp;
let people: Awaited<ReturnType<typeof createCrew>>;
let planner: Client;
let growerA: Client;
let growerB: Client;
const contactA = 'orchard-office-a@example.test';

async function newContract(growerId = people.growerA) {
  const [site] = await t.db.query(
    `INSERT INTO sites (operation_id, grower_id, name, kind, crop, latitude, longitude)
     VALUES ($1, $2, 'North block', 'orchard', 'almond', 36.6, -120.3) RETURNING id`,
    [people.operationId, growerId],
  );
  const [row] = await t.db.query(
    `INSERT INTO contracts (operation_id, grower_id, site_ids, crop, season, status, colonies_ordered,
       min_frames, fee_per_colony_cents, delivery_start_on, delivery_end_on)
     VALUES ($1, $2, ARRAY[$3]::uuid[], 'almond', 2027, 'draft', 400, 6, 19000, '2027-02-01', '2027-02-08')
     RETURNING id`,
    [people.operationId, growerId, site.id],
  );
  return row.id as string;
}

/** Proposes dates for a contract and returns the grower's e-mail and the proposal. */
async function propose(contractId: string, window = { start: '2027-02-05', end: '2027-02-11' }) {
  const response = await planner.post(`/api/contracts/${contractId}/proposals`, {
    deliveryStartOn: window.start,
    deliveryEndOn: window.end,
    colonies: 380,
    note: 'Gate on Road 12.',
  });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  const message = await t.fake.waitFor(
    (m) => m.to.includes(contactA) && m.text.includes(`/respond/`) && !seen.has(m.id),
  );
  seen.add(message.id);
  return { proposal: response.body.proposal, body: response.body, message };
}
const seen = new Set<number>();

const contractOf = async (id: string) =>
  (
    await t.db.query(
      `SELECT status, delivery_start_on::text AS start, delivery_end_on::text AS end, colonies_ordered
         FROM contracts WHERE id = $1`,
      [id],
    )
  )[0];
const eventsOf = async (id: string) =>
  (
    await t.db.query(
      `SELECT kind, detail FROM contract_events WHERE contract_id = $1 ORDER BY occurred_at`,
      [id],
    )
  ).map((e: { kind: string }) => e.kind);

beforeAll(async () => {
  t = await startMailTestApp();
  people = await createCrew(t.db);
  await t.db.query(
    `INSERT INTO grower_contacts (operation_id, grower_id, name, email) VALUES ($1, $2, 'Orchard office', $3)`,
    [people.operationId, people.growerA, contactA],
  );
  planner = await signedInClient(t.app, people.planner.email, testPassword);
  growerA = await signedInClient(t.app, people.growerUserA.email, testPassword);
  growerB = await signedInClient(t.app, people.growerUserB.email, testPassword);
}, 60_000);
afterAll(() => t?.close());

describe('POST /api/contracts/:id/proposals → e-mail → /respond/:token', () => {
  it('when the grower follows the confirm link and presses the button then the contract is agreed', async () => {
    const contractId = await newContract();
    const { body, message } = await propose(contractId);
    expect(body.contract.status).toBe('offered');
    expect(body.emailedTo).toEqual([contactA]);
    expect(message.subject).toContain('2027');
    expect(message.html).toContain('Yes, these dates work');

    const ics = message.attachments.find((a) => a.filename.endsWith('.ics'));
    expect(ics?.contentType).toContain('text/calendar');
    expect(ics?.text).toContain('BEGIN:VCALENDAR');
    expect(ics?.text).toContain('DTSTART;VALUE=DATE:20270205');
    expect(ics?.text).toContain('DTEND;VALUE=DATE:20270212'); // exclusive end: the day after
    expect(ics?.text).toContain('STATUS:TENTATIVE');

    const confirm = pathOf(linkAfter(message, 'Yes, these dates work'));
    const page = await supertest(t.app).get(confirm);
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toContain('text/html');
    expect(page.headers['referrer-policy']).toBe('no-referrer');
    expect(page.headers['cache-control']).toBe('no-store');
    expect(page.headers['set-cookie']).toBeUndefined();
    expect(page.headers['content-security-policy']).toContain("script-src 'self'");
    expect(page.text).toContain('Confirm these delivery dates?');
    expect(page.text).not.toContain('<script');
    // Opening the link changed nothing.
    expect((await contractOf(contractId)).status).toBe('offered');

    const done = await supertest(t.app)
      .post(confirm)
      .type('form')
      .send({ note: 'Water at the pump.' });
    expect(done.status).toBe(200);
    expect(done.text).toContain('delivery confirmed');
    expect(done.headers['set-cookie']).toBeUndefined();
    expect(await contractOf(contractId)).toEqual({
      status: 'agreed',
      start: '2027-02-05',
      end: '2027-02-11',
      colonies_ordered: 380,
    });
    expect(await eventsOf(contractId)).toEqual(['offered', 'agreed']);

    // The planner is told by e-mail and in the app; the grower gets the agreed window.
    const toPlanner = await t.fake.waitFor(
      (m) => m.to.includes(people.planner.email) && m.subject.includes('confirmed'),
    );
    expect(toPlanner.text).toContain(`${'http://duskhaul.test'}/contracts/${contractId}`);
    const agreed = await t.fake.waitFor(
      (m) => m.to.includes(contactA) && m.subject.startsWith('Bee delivery agreed'),
    );
    expect(agreed.attachments[0].text).toContain('STATUS:CONFIRMED');
    const notices = await planner.get('/api/notifications');
    expect(notices.status).toBe(200);
    const notice = notices.body.items.find(
      (n: { relatedId: string }) => n.relatedId === contractId,
    );
    expect(notice).toMatchObject({ kind: 'proposal-confirmed', readAt: null });
    const read = await planner.post(`/api/notifications/${notice.id}/read`);
    expect(read.status).toBe(200);
    expect(read.body.readAt).not.toBeNull();

    // Used: the same link, and its siblings, now explain themselves with 410.
    const again = await supertest(t.app).post(confirm).type('form').send({});
    expect(again.status).toBe(410);
    expect(again.text).toContain('no longer active');
    expect((await supertest(t.app).get(confirm)).status).toBe(410);
    const decline = pathOf(linkAfter(message, 'No, these dates do not work'));
    expect((await supertest(t.app).post(decline).type('form').send({})).status).toBe(410);
    expect((await contractOf(contractId)).status).toBe('agreed');
  });

  it('when the grower follows the decline link then the contract is turned down and the planner told', async () => {
    const contractId = await newContract();
    const { message } = await propose(contractId);
    const decline = pathOf(linkAfter(message, 'No, these dates do not work'));
    expect((await supertest(t.app).get(decline)).text).toContain('Decline these delivery dates?');
    const done = await supertest(t.app)
      .post(decline)
      .type('form')
      .send({ note: 'Bloom is late this year.' });
    expect(done.status).toBe(200);
    expect((await contractOf(contractId)).status).toBe('turned-down');
    expect(await eventsOf(contractId)).toEqual(['offered', 'turned-down']);
    const toPlanner = await t.fake.waitFor(
      (m) => m.to.includes(people.planner.email) && m.subject.includes('declined'),
    );
    expect(toPlanner.text).toContain('Bloom is late this year.');
  });

  it('when the grower suggests another window then it is stored, the contract stays offered and the planner is told', async () => {
    const contractId = await newContract();
    const { message, proposal } = await propose(contractId);
    const counter = pathOf(linkAfter(message, 'Suggest another window'));
    const form = await supertest(t.app).get(counter);
    expect(form.text).toContain('name="deliveryStartOn"');

    // A bad form is shown again with its problem, and the link still works.
    const bad = await supertest(t.app)
      .post(counter)
      .type('form')
      .send({ deliveryStartOn: '2027-02-20', deliveryEndOn: '2027-02-10' });
    expect(bad.status).toBe(400);
    expect(bad.text).toContain('ends on or after it starts');

    const done = await supertest(t.app).post(counter).type('form').send({
      deliveryStartOn: '2027-02-12',
      deliveryEndOn: '2027-02-16',
      colonies: '350',
      note: 'Later please, the Nonpareil is slow.',
    });
    expect(done.status).toBe(200);
    expect((await contractOf(contractId)).status).toBe('offered');
    expect(await eventsOf(contractId)).toEqual(['offered', 'countered']);
    const list = await planner.get(`/api/proposals?contractId=${contractId}`);
    expect(list.body.items[0]).toMatchObject({
      id: proposal.id,
      status: 'countered',
      respondedVia: 'link',
      counter: { deliveryStartOn: '2027-02-12', deliveryEndOn: '2027-02-16', colonies: 350 },
      responseNote: 'Later please, the Nonpareil is slow.',
    });
    await t.fake.waitFor(
      (m) => m.to.includes(people.planner.email) && m.subject.includes('another delivery window'),
    );
  });

  it('when a link is tampered with or made up then it gets 404 and changes nothing', async () => {
    const contractId = await newContract();
    const { message } = await propose(contractId);
    const confirm = pathOf(linkAfter(message, 'Yes, these dates work'));
    const last = confirm.at(-1) === 'A' ? 'B' : 'A';
    const tampered = confirm.slice(0, -1) + last;
    expect((await supertest(t.app).get(tampered)).status).toBe(404);
    const post = await supertest(t.app).post(tampered).type('form').send({});
    expect(post.status).toBe(404);
    expect(post.text).toContain('do not recognise this link');
    expect((await supertest(t.app).get('/respond/short')).status).toBe(404);
    expect((await supertest(t.app).post('/respond/%00..%2F').type('form').send({})).status).toBe(
      404,
    );
    expect((await contractOf(contractId)).status).toBe('offered');
  });

  it('when a link has expired then it gets 410', async () => {
    const contractId = await newContract();
    const { message, proposal } = await propose(contractId);
    await t.db.query(
      `UPDATE proposal_tokens SET expires_at = now() - interval '1 minute' WHERE proposal_id = $1`,
      [proposal.id],
    );
    const confirm = pathOf(linkAfter(message, 'Yes, these dates work'));
    expect((await supertest(t.app).get(confirm)).status).toBe(410);
    expect((await supertest(t.app).post(confirm).type('form').send({})).status).toBe(410);
    expect((await contractOf(contractId)).status).toBe('offered');
  });

  it('when newer dates are sent then the older links get 410', async () => {
    const contractId = await newContract();
    const first = await propose(contractId);
    const second = await propose(contractId, { start: '2027-02-07', end: '2027-02-12' });
    const old = pathOf(linkAfter(first.message, 'Yes, these dates work'));
    expect((await supertest(t.app).post(old).type('form').send({})).status).toBe(410);
    const current = pathOf(linkAfter(second.message, 'Yes, these dates work'));
    expect((await supertest(t.app).post(current).type('form').send({})).status).toBe(200);
    expect((await contractOf(contractId)).start).toBe('2027-02-07');
  });

  it('when ten confirmations of one link race then exactly one succeeds', async () => {
    const contractId = await newContract();
    const { message } = await propose(contractId);
    const confirm = pathOf(linkAfter(message, 'Yes, these dates work'));
    const statuses = await Promise.all(
      Array.from({ length: 10 }, () =>
        supertest(t.app)
          .post(confirm)
          .type('form')
          .send({})
          .then((r) => r.status),
      ),
    );
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 410)).toHaveLength(9);
    expect(await eventsOf(contractId)).toEqual(['offered', 'agreed']);
  });
});

describe('/api/proposals (orchard portal)', () => {
  it('when grower A confirms in the portal then the contract is agreed; grower B cannot see or answer it', async () => {
    const contractId = await newContract();
    const { proposal } = await propose(contractId);
    const listB = await growerB.get('/api/proposals');
    expect(listB.body.items.map((p: { id: string }) => p.id)).not.toContain(proposal.id);
    expect((await growerB.post(`/api/proposals/${proposal.id}/confirm`, {})).status).toBe(404);
    expect((await growerB.get(`/api/contracts/${contractId}`)).status).toBe(404);
    expect((await planner.post(`/api/proposals/${proposal.id}/confirm`, {})).status).toBe(403);

    const open = await growerA.get('/api/proposals?status=open');
    expect(open.body.items.map((p: { id: string }) => p.id)).toContain(proposal.id);
    const done = await growerA.post(`/api/proposals/${proposal.id}/confirm`, {
      note: 'See you then.',
    });
    expect(done.status).toBe(200);
    expect(done.body.contract.status).toBe('agreed');
    expect(done.body.contract.internalNotes).toBeUndefined();
    expect(done.body.proposal).toMatchObject({ status: 'confirmed', respondedVia: 'portal' });
    expect((await growerA.post(`/api/proposals/${proposal.id}/decline`, {})).status).toBe(409);
    await t.fake.waitFor(
      (m) => m.to.includes(people.planner.email) && m.subject.includes('confirmed'),
    );
  });

  it('when a contract is in bloom then no new dates can be proposed (409), and bad input is 400', async () => {
    const contractId = await newContract();
    await t.db.query(`UPDATE contracts SET status = 'in-bloom' WHERE id = $1`, [contractId]);
    const blocked = await planner.post(`/api/contracts/${contractId}/proposals`, {
      deliveryStartOn: '2027-02-05',
      deliveryEndOn: '2027-02-11',
      colonies: 10,
    });
    expect(blocked.status).toBe(409);
    const bad = await planner.post(`/api/contracts/${contractId}/proposals`, {
      deliveryStartOn: '2027-02-11',
      deliveryEndOn: '2027-02-05',
      colonies: 0,
      status: 'agreed',
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((d: { field: string }) => d.field).sort()).toEqual([
      'colonies',
      'deliveryEndOn',
      'status',
    ]);
  });
});

describe('sent_emails', () => {
  it('when the dust settles then every e-mail in the outbox has a sent row with its message id', async () => {
    const rows = await settledEmails(t.db, people.operationId);
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.every((r) => r.status === 'sent')).toBe(true);
    const ids = new Set(rows.map((r) => r.provider_message_id));
    const delivered = t.fake.messages.filter((m) =>
      m.to.some(
        (to) => to === contactA || to === people.planner.email || to === people.owner.email,
      ),
    );
    expect(delivered.length).toBe(rows.length);
    for (const m of delivered) expect(ids.has(m.messageId)).toBe(true);
  });
});
