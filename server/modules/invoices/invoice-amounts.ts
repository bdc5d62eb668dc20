import type { EntityManager } from 'typeorm';
import { computeInvoice, type StrengthTerms } from '../../../shared/domain/invoice';
import { summariseStrength } from '../../../shared/domain/strength';
import type { InvoiceBasis, InvoiceLineItem } from '../../../shared/schemas/invoices';
import type { Contract } from '../contracts/contract.entity';

const dollars = (cents: number) => (cents / 100).toFixed(2);

/**
 * Colonies placed for a contract, from the ledger: the most colonies present at once at the
 * contract's sites between the start of its delivery window and its removal date (or any later
 * entry when it has none). Counts at a date include entries of that day; a move between two of
 * the contract's own sites nets to zero. Taking the peak means colonies already removed after
 * bloom (or lost after delivery) are still billed as delivered.
 */
export async function coloniesPlaced(tx: EntityManager, contract: Contract): Promise<number> {
  if (contract.siteIds.length === 0) return 0;
  const [row]: Array<{ peak: number | null }> = await tx.query(
    `WITH flows AS (
       SELECT occurred_on, delta FROM ledger_flows
        WHERE operation_id = $1 AND place_kind = 'site' AND place_id = ANY($2::uuid[])),
     days AS (
       SELECT $3::date AS d
       UNION SELECT occurred_on FROM flows
        WHERE occurred_on > $3::date AND ($4::date IS NULL OR occurred_on <= $4::date))
     SELECT MAX((SELECT COALESCE(SUM(delta), 0) FROM flows WHERE occurred_on <= days.d))::int AS peak
       FROM days`,
    [contract.operationId, contract.siteIds, contract.deliveryStartOn, contract.removalOn],
  );
  return Math.max(0, row?.peak ?? 0);
}

/** Frames of bees of every colony sampled at the contract's sites during its span. */
async function framesSampled(tx: EntityManager, contract: Contract): Promise<number[]> {
  if (contract.siteIds.length === 0) return [];
  const rows: Array<{ frames: number[] }> = await tx.query(
    `SELECT frames FROM strength_samples
      WHERE operation_id = $1 AND place_kind = 'site' AND place_id = ANY($2::uuid[])
        AND sampled_on >= $3::date AND ($4::date IS NULL OR sampled_on <= $4::date)
      ORDER BY sampled_on, created_at`,
    [contract.operationId, contract.siteIds, contract.deliveryStartOn, contract.removalOn],
  );
  return rows.flatMap((r) => r.frames.map(Number));
}

/** The deposit invoice's lines: the contract's agreed deposit. */
export function depositLines(contract: Contract): {
  lines: InvoiceLineItem[];
  basis: InvoiceBasis;
} {
  return {
    lines: [
      {
        kind: 'deposit',
        description: `Deposit: ${contract.coloniesOrdered} colonies ordered for ${contract.crop} pollination, season ${contract.season}`,
        amountCents: contract.depositCents,
      },
    ],
    basis: { feePerColonyCents: contract.feePerColonyCents },
  };
}

/**
 * The balance invoice's lines: colonies placed × fee, a strength adjustment when the contract
 * has frame terms and the sites were inspected, less the deposit already paid. The measured
 * average is rounded to 2 decimals before use, so the printed figures reproduce the amount.
 * A negative `frameAdjustmentCents` means reductions only (no bonus), at its absolute value.
 */
export async function balanceLines(
  tx: EntityManager,
  contract: Contract,
  depositPaidCents: number,
): Promise<{ lines: InvoiceLineItem[]; basis: InvoiceBasis }> {
  const placed = await coloniesPlaced(tx, contract);
  const basis: InvoiceBasis = {
    coloniesPlaced: placed,
    feePerColonyCents: contract.feePerColonyCents,
    depositPaidCents,
    strength: null,
  };
  let strength: StrengthTerms | undefined;
  if (contract.frameAdjustmentCents !== 0) {
    const frames = await framesSampled(tx, contract);
    if (contract.averageFrames === null) {
      basis.strengthNote = 'The contract names no average frames of bees to adjust against.';
    } else if (frames.length < 2) {
      basis.strengthNote = 'Fewer than 2 colonies were inspected at the contract’s sites.';
    } else {
      const summary = summariseStrength(frames, contract.minFrames);
      const terms = {
        targetAverageFrames: contract.averageFrames,
        measuredAverageFrames: Math.round(summary.meanFrames * 100) / 100,
        perFramePerColonyCents: Math.abs(contract.frameAdjustmentCents),
        reductionsOnly: contract.frameAdjustmentCents < 0,
      };
      strength = terms;
      basis.strength = { coloniesSampled: summary.samples, ...terms };
    }
  }
  const computed = computeInvoice({
    coloniesPlaced: placed,
    feePerColonyCents: contract.feePerColonyCents,
    depositPaidCents,
    strength,
  });
  const lines: InvoiceLineItem[] = computed.lines.map((line) =>
    line.kind === 'fee'
      ? {
          ...line,
          description: `Pollination fee: ${placed} colonies placed × ${dollars(contract.feePerColonyCents)}`,
        }
      : line.kind === 'strength-adjustment'
        ? {
            ...line,
            description: `Strength ${line.amountCents > 0 ? 'bonus' : 'reduction'}: average ${strength?.measuredAverageFrames.toFixed(2)} frames of bees vs ${strength?.targetAverageFrames} agreed, × ${dollars(strength?.perFramePerColonyCents ?? 0)} per frame per colony`,
          }
        : line,
  );
  if (depositPaidCents > 0)
    lines.push({
      kind: 'deposit-paid',
      description: 'Deposit received',
      amountCents: -depositPaidCents,
    });
  return { lines, basis };
}

/** The invoice total: the sum of its rounded lines. */
export const totalOf = (lines: InvoiceLineItem[]) => lines.reduce((s, l) => s + l.amountCents, 0);
