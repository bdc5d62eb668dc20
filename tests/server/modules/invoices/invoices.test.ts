import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, type Client } from '../../../support/test-app';
import { createCrew, createOperation, createUser, testPassword } from '../../../support/factories';
import { startMailTestApp, type MailTestApp } from '../emails/support';
import { billingFixtures } from './billing-fixtures';

let t: MailTestApp;
let people: Awaited<ReturnType<typeof createCrew>>;
let c: Record<'owner' | 'planner' | 'crew' | 'growerA' | 'growerB' | 'otherOwner', Client>;
let f: ReturnType<typeof billingFixtures>;

beforeAll(async () => {
  t = await startMailTestApp();
  people = await createCrew(t.db);
  f = billingFixtures(t.db, people.operationId);
  const otherOwner = await createUser(t.db, await createOperation(t.db, 'Other'), 'owner');
  c = {
    owner: await signedInClient(t.app, people.owner.email, testPassword),
    planner: await signedInClient(t.app, people.planner.email, testPassword),
    crew: await signedInClient(t.app, people.crew.email, testPassword),
    growerA: await signedInClient(t.app, people.growerUserA.email, testPassword),
    growerB: await signedInClient(t.app, people.growerUserB.email, testPassword),
    otherOwner: await signedInClient(t.app, otherOwner.email, testPassword),
  };
}, 60_000);
afterAll(() => t?.close());

const invoiceRows = async () =>
  (
    await t.db.query(`SELECT count(*)::int AS n FROM invoices WHERE operation_id = $1`, [
      people.operationId,
    ])
  )[0].n as number;

/**
 * Worked example A (almond, season 2027): fee $195.00 a colony, deposit $5,000.00, strength
 * adjusted ±$7.50 a frame a colony around an agreed average of 8 frames of bees.
 * Placed: 60 colonies on block 1 (Feb 3) and 36 on block 2 (Feb 5); 10 moved between the two
 * blocks (nets to zero) and 2 lost after delivery: the most there at once is 96 colonies.
 * Inspection on both blocks: 7, 8, 9, 6, 7 and 8, 7, 9, 6, 8 → 75 frames / 10 = 7.50 average.
 *   fee        96 × 195.00                  = 18,720.00
 *   strength   96 × (7.50 − 8) × 7.50      =   −360.00
 *   deposit received                        = −5,000.00
 *   balance due                             = 13,360.00
 */
async function workedExampleA() {
  const block1 = await f.site(people.growerA, 'Block 1');
  const block2 = await f.site(people.growerA, 'Block 2');
  const contractId = await f.contract({
    growerId: people.growerA,
    siteIds: [block1, block2],
    averageFrames: 8,
    feePerColonyCents: 19_500,
    depositCents: 500_000,
    frameAdjustmentCents: 750,
  });
  // Last season's stay on block 1 is not this contract's.
  await f.move('2026-02-05', 20, 'yard', block1);
  await f.move('2026-03-10', 20, block1, 'yard');
  await f.inspect('site', block1, '2026-02-20', [2, 2, 2]);
  await f.move('2027-02-03', 60, 'yard', block1);
  await f.move('2027-02-05', 36, 'yard', block2);
  await f.move('2027-02-06', 10, block1, block2);
  await f.loss('2027-02-20', 2, block2);
  await f.inspect('site', block1, '2027-02-12', [7, 8, 9, 6, 7]);
  await f.inspect('site', block2, '2027-02-13', [8, 7, 9, 6, 8]);
  await f.move('2027-03-15', 50, block1, 'yard');
  await f.move('2027-03-15', 44, block2, 'yard');
  return contractId;
}

describe('POST /api/invoices', () => {
  it('when the owner bills worked example A then the deposit is 5,000.00 and, once paid, the balance is 13,360.00', async () => {
    const contractId = await workedExampleA();
    const deposit = await c.owner.post('/api/invoices', { contractId, kind: 'deposit' });
    expect(deposit.status, JSON.stringify(deposit.body)).toBe(201);
    expect(deposit.body).toMatchObject({
      kind: 'deposit',
      status: 'draft',
      amountCents: 500_000,
      outstandingCents: 500_000,
      growerId: people.growerA,
      issuedOn: null,
    });
    expect(deposit.body.lines).toHaveLength(1);

    // The balance waits for the deposit to be collected (or voided).
    const early = await c.owner.post('/api/invoices', { contractId, kind: 'balance' });
    expect(early.status).toBe(409);
    await f.markPaid(deposit.body.id, 500_000, `test-deposit-${contractId}`);

    const balance = await c.owner.post('/api/invoices', { contractId, kind: 'balance' });
    expect(balance.status, JSON.stringify(balance.body)).toBe(201);
    expect(
      balance.body.lines.map((l: { kind: string; amountCents: number }) => [l.kind, l.amountCents]),
    ).toEqual([
      ['fee', 1_872_000],
      ['strength-adjustment', -36_000],
      ['deposit-paid', -500_000],
    ]);
    expect(balance.body.amountCents).toBe(1_336_000);
    expect(balance.body.basis).toMatchObject({
      coloniesPlaced: 96,
      depositPaidCents: 500_000,
      strength: { coloniesSampled: 10, measuredAverageFrames: 7.5, targetAverageFrames: 8 },
    });
    expect(balance.body.number).toBe(deposit.body.number + 1);

    const again = await c.owner.post('/api/invoices', { contractId, kind: 'balance' });
    expect(again.status).toBe(409);
  });

  it('when worked example B has a half cent then the strength line rounds half away from zero (−161.505 → −161.51)', async () => {
    // 97 colonies × $187.50 = 18,187.50; 97 × (7.50 − 8) × $3.33 = −161.505 → −161.51 (no deposit).
    const block = await f.site(people.growerA, 'Block B1');
    const contractId = await f.contract({
      growerId: people.growerA,
      siteIds: [block],
      averageFrames: 8,
      feePerColonyCents: 18_750,
      frameAdjustmentCents: 333,
    });
    await f.move('2027-02-02', 97, 'yard', block);
    await f.inspect('site', block, '2027-02-09', [7, 8, 7, 8, 7, 8]);
    const balance = await c.owner.post('/api/invoices', { contractId, kind: 'balance' });
    expect(balance.status, JSON.stringify(balance.body)).toBe(201);
    expect(balance.body.lines.map((l: { amountCents: number }) => l.amountCents)).toEqual([
      1_818_750, -16_151,
    ]);
    expect(balance.body.amountCents).toBe(1_802_599);
  });

  it('when the contract pays reductions only (negative per-frame term) and colonies are stronger then no bonus line is added', async () => {
    // Worked example C: 10 colonies × $200.00, average 9.00 vs 8 agreed, reductions only → 2,000.00.
    const block = await f.site(people.growerA, 'Block C1');
    const contractId = await f.contract({
      growerId: people.growerA,
      siteIds: [block],
      averageFrames: 8,
      feePerColonyCents: 20_000,
      frameAdjustmentCents: -500,
    });
    await f.move('2027-02-04', 10, 'yard', block);
    await f.inspect('site', block, '2027-02-09', [9, 9, 9]);
    const balance = await c.owner.post('/api/invoices', { contractId, kind: 'balance' });
    expect(balance.body.lines).toHaveLength(1);
    expect(balance.body.amountCents).toBe(200_000);
  });

  it('when nothing was placed, or the contract is only a draft, then 409 and no invoice', async () => {
    const before = await invoiceRows();
    const empty = await f.contract({ growerId: people.growerA, feePerColonyCents: 10_000 });
    expect(
      (await c.owner.post('/api/invoices', { contractId: empty, kind: 'balance' })).status,
    ).toBe(409);
    expect(
      (await c.owner.post('/api/invoices', { contractId: empty, kind: 'deposit' })).status,
    ).toBe(409); // no deposit
    const draft = await f.contract({
      growerId: people.growerA,
      feePerColonyCents: 1,
      depositCents: 100,
      status: 'draft',
    });
    expect(
      (await c.owner.post('/api/invoices', { contractId: draft, kind: 'deposit' })).status,
    ).toBe(409);
    expect(await invoiceRows()).toBe(before);
  });

  it('when the body carries lines, an amount or an unknown contract then 400 naming the field', async () => {
    const contractId = await f.contract({
      growerId: people.growerA,
      feePerColonyCents: 1,
      depositCents: 100,
    });
    const extra = await c.owner.post('/api/invoices', {
      contractId,
      kind: 'deposit',
      amountCents: 1,
    });
    expect(extra.status).toBe(400);
    expect(extra.body.error.details).toEqual([
      { field: 'amountCents', message: 'Not accepted here.' },
    ]);
    const unknown = await c.owner.post('/api/invoices', {
      contractId: '00000000-0000-4000-8000-000000000000',
      kind: 'deposit',
    });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.details[0].field).toBe('contractId');
  });

  it('when ten contracts are billed at once then the numbers are ten consecutive, distinct numbers', async () => {
    const contractIds = await Promise.all(
      Array.from({ length: 10 }, () =>
        f.contract({ growerId: people.growerB, feePerColonyCents: 15_000, depositCents: 100_000 }),
      ),
    );
    const made = await Promise.all(
      contractIds.map((contractId) =>
        c.owner.post('/api/invoices', { contractId, kind: 'deposit' }),
      ),
    );
    expect(made.map((r) => r.status)).toEqual(Array(10).fill(201));
    const numbers = made.map((r) => r.body.number as number).sort((a, b) => a - b);
    expect(new Set(numbers).size).toBe(10);
    expect(numbers[9] - numbers[0]).toBe(9);
  });

  it('when a planner, crew or grower tries to bill then 403 and nothing is written', async () => {
    const contractId = await f.contract({
      growerId: people.growerA,
      feePerColonyCents: 1,
      depositCents: 100,
    });
    const before = await invoiceRows();
    for (const who of ['planner', 'crew', 'growerA'] as const)
      expect((await c[who].post('/api/invoices', { contractId, kind: 'deposit' })).status).toBe(
        403,
      );
    expect(await invoiceRows()).toBe(before);
  });
});

describe('POST /api/invoices/:id/issue and /void', () => {
  it('when the owner issues a draft then it is sent, due net 30, and the grower is e-mailed a link to it', async () => {
    await f.contact(people.growerA, 'orchard-office@example.test');
    const contractId = await f.contract({
      growerId: people.growerA,
      feePerColonyCents: 20_000,
      depositCents: 250_050,
    });
    const draft = (await c.owner.post('/api/invoices', { contractId, kind: 'deposit' })).body;
    const stale = await c.owner.post(`/api/invoices/${draft.id}/issue`, {
      version: draft.version + 1,
    });
    expect(stale.status).toBe(409);
    const planner = await c.planner.post(`/api/invoices/${draft.id}/issue`, {
      version: draft.version,
    });
    expect(planner.status).toBe(403);

    const sent = await c.owner.post(`/api/invoices/${draft.id}/issue`, { version: draft.version });
    expect(sent.status, JSON.stringify(sent.body)).toBe(200);
    const today = new Date().toISOString().slice(0, 10);
    const due = new Date(Date.parse(`${today}T00:00:00Z`) + 30 * 86_400_000)
      .toISOString()
      .slice(0, 10);
    expect(sent.body).toMatchObject({
      status: 'sent',
      issuedOn: today,
      dueOn: due,
      version: draft.version + 1,
    });
    expect(
      (await c.owner.post(`/api/invoices/${draft.id}/issue`, { version: sent.body.version }))
        .status,
    ).toBe(409);

    const mail = await t.fake.waitFor(
      (m) =>
        m.to.includes('orchard-office@example.test') &&
        m.subject.includes(`Invoice ${draft.number}`),
    );
    expect(mail.subject).toContain('$2,500.50');
    expect(mail.text).toContain(`http://duskhaul.test/invoices/${draft.id}`);
    const [row] = await t.db.query(
      `SELECT purpose, related_kind FROM sent_emails WHERE related_id = $1`,
      [draft.id],
    );
    expect(row).toEqual({ purpose: 'invoice', related_kind: 'invoice' });
  });

  it('when the owner voids a draft then it is void, keeps its number, and the contract can be billed again', async () => {
    const contractId = await f.contract({
      growerId: people.growerA,
      feePerColonyCents: 1,
      depositCents: 100,
    });
    const draft = (await c.owner.post('/api/invoices', { contractId, kind: 'deposit' })).body;
    const voided = await c.owner.post(`/api/invoices/${draft.id}/void`, { version: draft.version });
    expect(voided.status).toBe(200);
    expect(voided.body).toMatchObject({
      status: 'void',
      number: draft.number,
      outstandingCents: 0,
    });
    expect(
      (await c.owner.post(`/api/invoices/${draft.id}/void`, { version: voided.body.version }))
        .status,
    ).toBe(409);
    expect((await c.owner.post('/api/invoices', { contractId, kind: 'deposit' })).status).toBe(201);
  });

  it('when money was received on an invoice then it cannot be voided', async () => {
    const contractId = await f.contract({
      growerId: people.growerA,
      feePerColonyCents: 1,
      depositCents: 100,
    });
    const draft = (await c.owner.post('/api/invoices', { contractId, kind: 'deposit' })).body;
    await f.markPaid(draft.id, 100, `test-void-${draft.id}`);
    const fresh = (await c.owner.get(`/api/invoices/${draft.id}`)).body;
    expect(
      (await c.owner.post(`/api/invoices/${draft.id}/void`, { version: fresh.version })).status,
    ).toBe(409);
  });
});

describe('GET /api/invoices', () => {
  it('when crew ask for invoices then every invoice route answers 403', async () => {
    const contractId = await f.contract({
      growerId: people.growerA,
      feePerColonyCents: 1,
      depositCents: 100,
    });
    const draft = (await c.owner.post('/api/invoices', { contractId, kind: 'deposit' })).body;
    const routes = [
      c.crew.get('/api/invoices'),
      c.crew.get(`/api/invoices/${draft.id}`),
      c.crew.get('/api/invoices/export.csv'),
      c.crew.get('/api/payments/export.csv'),
      c.crew.get('/api/receivables'),
      c.crew.post('/api/invoices', { contractId, kind: 'deposit' }),
      c.crew.post(`/api/invoices/${draft.id}/issue`, { version: 1 }),
      c.crew.post(`/api/invoices/${draft.id}/void`, { version: 1 }),
      c.crew.post(`/api/invoices/${draft.id}/checkout`, {}),
    ];
    for (const response of await Promise.all(routes)) expect(response.status).toBe(403);
  });

  it('when growers read invoices then each sees only their own, without internal notes; another grower’s reads as 404', async () => {
    const contractId = await f.contract({
      growerId: people.growerA,
      feePerColonyCents: 1,
      depositCents: 100,
    });
    const mine = (
      await c.owner.post('/api/invoices', {
        contractId,
        kind: 'deposit',
        internalNotes: 'chase by phone',
      })
    ).body;
    expect(mine.internalNotes).toBe('chase by phone');
    const asA = await c.growerA.get(`/api/invoices/${mine.id}`);
    expect(asA.status).toBe(200);
    expect(asA.body.internalNotes).toBeUndefined();
    expect(asA.body.payments).toEqual([]);
    expect((await c.growerB.get(`/api/invoices/${mine.id}`)).status).toBe(404);
    expect((await c.otherOwner.get(`/api/invoices/${mine.id}`)).status).toBe(404);
    const listA = await c.growerA.get('/api/invoices?limit=500');
    expect(listA.body.items.length).toBeGreaterThan(0);
    expect(listA.body.items.every((i: { growerId: string }) => i.growerId === people.growerA)).toBe(
      true,
    );
    expect(listA.body.items.every((i: object) => !('internalNotes' in i))).toBe(true);
    const listB = await c.growerB.get(`/api/invoices?contractId=${contractId}`);
    expect(listB.body).toEqual({ items: [], total: 0 });
    // Asking for grower A's by filter does not widen grower B's view.
    const sneaky = await c.growerB.get(`/api/invoices?growerId=${people.growerA}`);
    expect(sneaky.body.total).toBe(0);
  });

  it('when a planner reads then the list and filters work, and every write is 403', async () => {
    const contractId = await f.contract({
      growerId: people.growerB,
      feePerColonyCents: 1,
      depositCents: 100,
    });
    const made = (await c.owner.post('/api/invoices', { contractId, kind: 'deposit' })).body;
    const list = await c.planner.get(`/api/invoices?contractId=${contractId}&status=draft`);
    expect(list.status).toBe(200);
    expect(list.body.items.map((i: { id: string }) => i.id)).toEqual([made.id]);
    expect(
      (await c.planner.get(`/api/invoices?growerId=${people.growerA}&contractId=${contractId}`))
        .body.total,
    ).toBe(0);
    expect((await c.planner.get('/api/invoices?status=unknown')).status).toBe(400);
    expect(
      (await c.planner.post(`/api/invoices/${made.id}/void`, { version: made.version })).status,
    ).toBe(403);
    expect((await c.planner.post(`/api/invoices/${made.id}/checkout`, {})).status).toBe(403);
    expect((await c.owner.get(`/api/invoices/${made.id}`)).body.status).toBe('draft');
  });
});

describe('GET /api/invoices/export.csv and /api/payments/export.csv', () => {
  it('when names hold commas, quotes, line breaks or formula starts then cells are quoted and defused', async () => {
    const [{ id: hostile }] = await t.db.query(
      `INSERT INTO growers (operation_id, name) VALUES ($1, $2) RETURNING id`,
      [people.operationId, '=HYPERLINK("http://evil.test","Click"), "Orchards"\nLtd'],
    );
    const contractId = await f.contract({
      growerId: hostile,
      feePerColonyCents: 1,
      depositCents: 12_345,
    });
    const draft = (await c.owner.post('/api/invoices', { contractId, kind: 'deposit' })).body;
    const reference = `@SUM(1+1)-${draft.id}`; // provider references are unique across runs
    await f.markPaid(draft.id, 12_345, reference);

    const invoicesCsv = await c.owner.get('/api/invoices/export.csv');
    expect(invoicesCsv.status).toBe(200);
    expect(invoicesCsv.headers['content-type']).toMatch(/^text\/csv/);
    expect(invoicesCsv.headers['content-disposition']).toBe('attachment; filename="invoices.csv"');
    const lines = invoicesCsv.text.split('\r\n');
    expect(lines[0]).toBe(
      'number,kind,status,grower,crop,season,issued_on,due_on,amount,paid,outstanding',
    );
    expect(invoicesCsv.text).toContain(
      `${draft.number},deposit,paid,"'=HYPERLINK(""http://evil.test"",""Click""), ""Orchards""\nLtd",almond,2027,,,123.45,123.45,0.00\r\n`,
    );

    const paymentsCsv = await c.owner.get('/api/payments/export.csv');
    expect(paymentsCsv.status).toBe(200);
    expect(paymentsCsv.text.split('\r\n')[0]).toBe(
      'received_at,invoice_number,grower,amount,provider_reference',
    );
    expect(paymentsCsv.text).toContain(`,123.45,'${reference}\r\n`);
    expect((await c.planner.get('/api/invoices/export.csv')).status).toBe(403);
    expect((await c.growerA.get('/api/payments/export.csv')).status).toBe(403);
  });
});
