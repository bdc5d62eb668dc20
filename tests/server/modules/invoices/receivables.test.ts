import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../../support/test-app';
import { createCrew, createGrower, testPassword } from '../../../support/factories';
import { ageBucket } from '../../../../server/modules/invoices/receivables';
import { billingFixtures } from './billing-fixtures';

let t: TestApp;
let people: Awaited<ReturnType<typeof createCrew>>;
let owner: Client;
let f: ReturnType<typeof billingFixtures>;

beforeAll(async () => {
  t = await startTestApp();
  people = await createCrew(t.db);
  f = billingFixtures(t.db, people.operationId);
  owner = await signedInClient(t.app, people.owner.email, testPassword);
}, 60_000);
afterAll(() => t?.close());

/** A deposit invoice, sent and due on `dueOn`, for a contract of `crop`. */
async function owed(growerId: string, cents: number, dueOn: string, crop = 'almond') {
  const contractId = await f.contract({
    growerId,
    crop,
    feePerColonyCents: 1,
    depositCents: cents,
  });
  const draft = (await owner.post('/api/invoices', { contractId, kind: 'deposit' })).body;
  await owner.post(`/api/invoices/${draft.id}/issue`, { version: draft.version });
  await t.db.query(`UPDATE invoices SET due_on = $2 WHERE id = $1`, [draft.id, dueOn]);
  return draft.id as string;
}

describe('ageBucket', () => {
  it('when days past due cross 0, 30, 60 and 90 then the bucket changes there', () => {
    expect([-5, 0, 1, 30, 31, 60, 61, 90, 91].map(ageBucket)).toEqual([
      'current',
      'current',
      '1-30',
      '1-30',
      '31-60',
      '31-60',
      '61-90',
      '61-90',
      '90+',
    ]);
  });
});

describe('GET /api/receivables', () => {
  it('when invoices are due on different dates then what is owed is split by grower and age, and revenue by crop', async () => {
    const growerC = await createGrower(t.db, people.operationId, 'Grower C');
    await owed(people.growerA, 100_000, '2027-03-31'); // current on 2027-03-31
    await owed(people.growerA, 20_000, '2027-03-01'); // 30 days
    await owed(people.growerA, 5_000, '2026-12-01', 'cherry'); // 120 days
    const part = await owed(growerC, 40_000, '2027-01-15'); // 75 days, 15,000 paid
    await t.db.query(
      `INSERT INTO payments (operation_id, invoice_id, amount_cents, provider_reference) VALUES ($1, $2, 15000, $3)`,
      [people.operationId, part, `receivables-part-${part}`],
    );
    const paid = await owed(people.growerB, 7_000, '2027-02-01');
    await f.markPaid(paid, 7_000, `receivables-paid-${paid}`);
    const draftContract = await f.contract({
      growerId: people.growerB,
      feePerColonyCents: 1,
      depositCents: 9_999,
    });
    await owner.post('/api/invoices', { contractId: draftContract, kind: 'deposit' }); // drafts are not owed

    const report = await owner.get('/api/receivables?asOf=2027-03-31&season=2027');
    expect(report.status, JSON.stringify(report.body)).toBe(200);
    expect(report.body.byGrower).toEqual([
      {
        growerId: people.growerA,
        growerName: 'Grower A',
        owedCents: 125_000,
        buckets: { current: 100_000, '1-30': 20_000, '31-60': 0, '61-90': 0, '90+': 5_000 },
      },
      {
        growerId: growerC,
        growerName: 'Grower C',
        owedCents: 25_000,
        buckets: { current: 0, '1-30': 0, '31-60': 0, '61-90': 25_000, '90+': 0 },
      },
    ]);
    expect(report.body.totals.owedCents).toBe(150_000);
    expect(report.body.revenueByCrop).toEqual([
      { crop: 'almond', invoices: 4, invoicedCents: 167_000, receivedCents: 22_000 },
      { crop: 'cherry', invoices: 1, invoicedCents: 5_000, receivedCents: 0 },
    ]);
    expect((await owner.get('/api/receivables?asOf=2027-02-30')).status).toBe(400);
  });
});
