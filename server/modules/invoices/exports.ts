import type { DataSource } from 'typeorm';
import { amountCell, toCsv } from './csv';

/** Every invoice of the operation as CSV, newest number first (owner's bookkeeping). */
export async function invoicesCsv(db: DataSource, operationId: string): Promise<string> {
  const rows: Array<{
    number: number;
    kind: string;
    status: string;
    grower_name: string;
    crop: string;
    season: number;
    issued_on: string | null;
    due_on: string | null;
    amount_cents: number;
    paid: number;
  }> = await db.query(
    `SELECT i.number, i.kind, i.status, g.name AS grower_name, c.crop, c.season,
            to_char(i.issued_on, 'YYYY-MM-DD') AS issued_on, to_char(i.due_on, 'YYYY-MM-DD') AS due_on,
            i.amount_cents,
            COALESCE((SELECT SUM(p.amount_cents) FROM payments p WHERE p.invoice_id = i.id), 0)::int AS paid
       FROM invoices i
       JOIN growers g ON g.id = i.grower_id
       JOIN contracts c ON c.id = i.contract_id
      WHERE i.operation_id = $1
      ORDER BY i.number DESC`,
    [operationId],
  );
  return toCsv(
    [
      'number',
      'kind',
      'status',
      'grower',
      'crop',
      'season',
      'issued_on',
      'due_on',
      'amount',
      'paid',
      'outstanding',
    ],
    rows.map((r) => [
      r.number,
      r.kind,
      r.status,
      r.grower_name,
      r.crop,
      r.season,
      r.issued_on,
      r.due_on,
      amountCell(r.amount_cents),
      amountCell(r.paid),
      amountCell(r.status === 'void' ? 0 : r.amount_cents - r.paid),
    ]),
  );
}

/** Every payment received by the operation as CSV, oldest first. */
export async function paymentsCsv(db: DataSource, operationId: string): Promise<string> {
  const rows: Array<{
    received_at: Date;
    number: number;
    grower_name: string;
    amount_cents: number;
    provider_reference: string;
  }> = await db.query(
    `SELECT p.received_at, i.number, g.name AS grower_name, p.amount_cents, p.provider_reference
       FROM payments p
       JOIN invoices i ON i.id = p.invoice_id
       JOIN growers g ON g.id = i.grower_id
      WHERE p.operation_id = $1
      ORDER BY p.received_at, i.number`,
    [operationId],
  );
  return toCsv(
    ['received_at', 'invoice_number', 'grower', 'amount', 'provider_reference'],
    rows.map((r) => [
      r.received_at.toISOString(),
      r.number,
      r.grower_name,
      amountCell(r.amount_cents),
      r.provider_reference,
    ]),
  );
}

/** Sends a CSV as a download. */
export function csvDownload(
  res: { setHeader(name: string, value: string): void; send(body: string): void },
  fileName: string,
  body: string,
) {
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Cache-Control', 'no-store');
  res.send(body);
}
