import type { DataSource } from 'typeorm';
import type { Actor } from '../../middleware/authorise';
import { ageBuckets, type AgeBucket } from '../../../shared/schemas/invoices';
import { todayUtc } from './invoices.service';

/** The bucket of an amount `daysPastDue` days past its due date (0 or less: current). */
export function ageBucket(daysPastDue: number): AgeBucket {
  if (daysPastDue <= 0) return 'current';
  if (daysPastDue <= 30) return '1-30';
  if (daysPastDue <= 60) return '31-60';
  if (daysPastDue <= 90) return '61-90';
  return '90+';
}

const emptyBuckets = (): Record<AgeBucket, number> =>
  Object.fromEntries(ageBuckets.map((b) => [b, 0])) as Record<AgeBucket, number>;

/**
 * What growers owe on sent invoices (amount less payments), by grower and by how long past due
 * on `asOf`; and the season's billed and received revenue by crop (sent and paid invoices).
 */
export async function receivables(
  db: DataSource,
  actor: Actor,
  query: { asOf?: string; season?: number },
) {
  const asOf = query.asOf ?? todayUtc();
  const season = query.season ?? Number(asOf.slice(0, 4));
  const open: Array<{
    grower_id: string;
    grower_name: string;
    outstanding: number;
    days_past_due: number;
  }> = await db.query(
    `SELECT i.grower_id, g.name AS grower_name,
            i.amount_cents - COALESCE((SELECT SUM(p.amount_cents) FROM payments p WHERE p.invoice_id = i.id), 0)::int AS outstanding,
            ($2::date - COALESCE(i.due_on, $2::date))::int AS days_past_due
       FROM invoices i JOIN growers g ON g.id = i.grower_id
      WHERE i.operation_id = $1 AND i.status = 'sent'`,
    [actor.operationId, asOf],
  );
  const byGrower = new Map<
    string,
    { growerId: string; growerName: string; owedCents: number; buckets: Record<AgeBucket, number> }
  >();
  const totals = { owedCents: 0, buckets: emptyBuckets() };
  for (const row of open) {
    if (row.outstanding <= 0) continue;
    const bucket = ageBucket(row.days_past_due);
    const entry = byGrower.get(row.grower_id) ?? {
      growerId: row.grower_id,
      growerName: row.grower_name,
      owedCents: 0,
      buckets: emptyBuckets(),
    };
    entry.owedCents += row.outstanding;
    entry.buckets[bucket] += row.outstanding;
    byGrower.set(row.grower_id, entry);
    totals.owedCents += row.outstanding;
    totals.buckets[bucket] += row.outstanding;
  }
  const crops: Array<{ crop: string; invoiced: number; received: number; invoices: number }> =
    await db.query(
      `SELECT c.crop, SUM(i.amount_cents)::int AS invoiced, count(*)::int AS invoices,
              COALESCE(SUM((SELECT SUM(p.amount_cents) FROM payments p WHERE p.invoice_id = i.id)), 0)::int AS received
         FROM invoices i JOIN contracts c ON c.id = i.contract_id
        WHERE i.operation_id = $1 AND c.season = $2 AND i.status IN ('sent', 'paid')
        GROUP BY c.crop ORDER BY c.crop`,
      [actor.operationId, season],
    );
  return {
    asOf,
    season,
    buckets: ageBuckets,
    byGrower: [...byGrower.values()].sort(
      (a, b) => b.owedCents - a.owedCents || a.growerName.localeCompare(b.growerName),
    ),
    totals,
    revenueByCrop: crops.map((c) => ({
      crop: c.crop,
      invoices: c.invoices,
      invoicedCents: c.invoiced,
      receivedCents: c.received,
    })),
  };
}
