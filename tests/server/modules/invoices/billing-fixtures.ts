import type { DataSource } from 'typeorm';
import { createHiveSetup, createLot, createYard } from '../../../support/factories';

/** Records for billing tests in one operation: sites, contracts, ledger moves, inspections. */
export function billingFixtures(db: DataSource, operationId: string) {
  let stock: Promise<{ lot: string; yard: string }> | undefined;
  /** One lot with 1,000 colonies bought into a home yard on 2026-01-01. */
  const home = () =>
    (stock ??= (async () => {
      const lot = await createLot(db, operationId, await createHiveSetup(db, operationId));
      const yard = await createYard(db, operationId, 'Home yard');
      await db.query(
        `INSERT INTO ledger_entries (operation_id, lot_id, kind, occurred_on, colonies, to_kind, to_id)
         VALUES ($1, $2, 'purchase', '2026-01-01', 1000, 'yard', $3)`,
        [operationId, lot, yard],
      );
      return { lot, yard };
    })());

  return {
    home,
    async site(growerId: string, name = 'Block') {
      const [row] = await db.query(
        `INSERT INTO sites (operation_id, grower_id, name, kind, crop, latitude, longitude)
         VALUES ($1, $2, $3, 'orchard', 'almond', 36.6, -120.3) RETURNING id`,
        [operationId, growerId, name],
      );
      return row.id as string;
    },
    async contract(values: {
      growerId: string;
      siteIds?: string[];
      crop?: string;
      season?: number;
      status?: string;
      coloniesOrdered?: number;
      minFrames?: number;
      averageFrames?: number | null;
      feePerColonyCents: number;
      depositCents?: number;
      frameAdjustmentCents?: number;
      deliveryStartOn?: string;
      deliveryEndOn?: string;
      removalOn?: string | null;
    }) {
      const [row] = await db.query(
        `INSERT INTO contracts (operation_id, grower_id, site_ids, crop, season, status, colonies_ordered, min_frames,
                                average_frames, fee_per_colony_cents, deposit_cents, frame_adjustment_cents,
                                delivery_start_on, delivery_end_on, removal_on, internal_notes)
         VALUES ($1, $2, $3::uuid[], $4, $5, $6, $7, $8, $9, $10, $11, $12, $13, $14, $15, 'internal: tight payer')
         RETURNING id`,
        [
          operationId,
          values.growerId,
          values.siteIds ?? [],
          values.crop ?? 'almond',
          values.season ?? 2027,
          values.status ?? 'agreed',
          values.coloniesOrdered ?? 100,
          values.minFrames ?? 6,
          values.averageFrames ?? null,
          values.feePerColonyCents,
          values.depositCents ?? 0,
          values.frameAdjustmentCents ?? 0,
          values.deliveryStartOn ?? '2027-02-01',
          values.deliveryEndOn ?? '2027-02-10',
          values.removalOn === undefined ? '2027-03-15' : values.removalOn,
        ],
      );
      return row.id as string;
    },
    /** A ledger move of colonies between places (`yard` means the home yard). */
    async move(on: string, colonies: number, from: string | 'yard', to: string | 'yard') {
      const { lot, yard } = await home();
      const place = (p: string) => (p === 'yard' ? ['yard', yard] : ['site', p]);
      const [fromKind, fromId] = place(from);
      const [toKind, toId] = place(to);
      await db.query(
        `INSERT INTO ledger_entries (operation_id, lot_id, kind, occurred_on, colonies, from_kind, from_id, to_kind, to_id)
         VALUES ($1, $2, 'move', $3, $4, $5, $6, $7, $8)`,
        [operationId, lot, on, colonies, fromKind, fromId, toKind, toId],
      );
    },
    async loss(on: string, colonies: number, siteId: string) {
      const { lot } = await home();
      await db.query(
        `INSERT INTO ledger_entries (operation_id, lot_id, kind, occurred_on, colonies, from_kind, from_id, reason)
         VALUES ($1, $2, 'loss', $3, $4, 'site', $5, 'dead-out')`,
        [operationId, lot, on, colonies, siteId],
      );
    },
    async inspect(placeKind: 'site' | 'yard', placeId: string, on: string, frames: number[]) {
      await db.query(
        `INSERT INTO strength_samples (operation_id, place_kind, place_id, sampled_on, frames)
         VALUES ($1, $2, $3, $4, $5)`,
        [operationId, placeKind, placeId, on, frames],
      );
    },
    /** Records money against an invoice as if received (the payments tests pay for real). */
    async markPaid(invoiceId: string, amountCents: number, reference: string) {
      await db.query(
        `INSERT INTO payments (operation_id, invoice_id, amount_cents, provider_reference) VALUES ($1, $2, $3, $4)`,
        [operationId, invoiceId, amountCents, reference],
      );
      await db.query(
        `UPDATE invoices SET status = 'paid', paid_at = now(), version = version + 1 WHERE id = $1`,
        [invoiceId],
      );
    },
    async contact(growerId: string, email: string) {
      await db.query(
        `INSERT INTO grower_contacts (operation_id, grower_id, name, email) VALUES ($1, $2, 'Billing contact', $3)`,
        [operationId, growerId, email],
      );
    },
  };
}
