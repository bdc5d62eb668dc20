/**
 * Pollination invoice amounts in integer cents: colonies placed × fee, strength adjustments,
 * deposit and balance. Each line is rounded once, half away from zero to the cent; totals are
 * sums of rounded lines, so the printed lines always add up.
 */
import { assertInRange, assertInteger } from './guards';

/** Rounds to the nearest integer, halves away from zero (2.5 → 3, −2.5 → −3). */
export function roundHalfAwayFromZero(value: number): number {
  if (!Number.isFinite(value)) throw new RangeError(`cannot round ${value}`);
  // Clean to 12 significant digits first, so 1.005 × 100 = 100.49999999999999 counts as a half.
  const magnitude = Math.floor(Number(Math.abs(value).toPrecision(12)) + 0.5);
  return magnitude === 0 ? 0 : Math.sign(value) * magnitude;
}

/** Strength terms of a contract. */
export interface StrengthTerms {
  /** Average frames of bees the fee is based on (e.g. 8 for almonds). */
  targetAverageFrames: number;
  /** Average measured at inspection. */
  measuredAverageFrames: number;
  /** Adjustment per frame per colony, cents (bonus above target, reduction below). */
  perFramePerColonyCents: number;
  /** Pay no bonus above the target, only reductions (default false). */
  reductionsOnly?: boolean;
  /** Colonies found below the contract minimum. */
  coloniesBelowMinimum?: number;
  /** Reduction per colony below the minimum, cents. */
  belowMinimumReductionCents?: number;
}

/** Input of computeInvoice. */
export interface InvoiceInput {
  /** Colonies placed. */
  coloniesPlaced: number;
  /** Fee per colony, cents. */
  feePerColonyCents: number;
  /** Deposit already paid, cents. */
  depositPaidCents?: number;
  /** Other payments already received, cents. */
  paymentsCents?: number;
  /** Strength terms, when the contract has them. */
  strength?: StrengthTerms;
}

/** One invoice line. */
export interface InvoiceLine {
  /** What the line is. */
  kind: 'fee' | 'strength-adjustment' | 'below-minimum';
  /** Text for the invoice. */
  description: string;
  /** Amount, cents (negative for a reduction). */
  amountCents: number;
}

/** Result of computeInvoice (cents). */
export interface Invoice {
  /** Lines in order. */
  lines: InvoiceLine[];
  /** Fee line. */
  feeCents: number;
  /** Sum of adjustment lines. */
  adjustmentsCents: number;
  /** Fee + adjustments. */
  totalCents: number;
  /** Deposit paid. */
  depositPaidCents: number;
  /** Other payments. */
  paymentsCents: number;
  /** Total − deposit − payments (negative when overpaid). */
  balanceCents: number;
}

/** Computes the invoice of a pollination contract, in integer cents. */
export function computeInvoice(input: InvoiceInput): Invoice {
  const {
    coloniesPlaced,
    feePerColonyCents,
    depositPaidCents = 0,
    paymentsCents = 0,
    strength,
  } = input;
  assertInteger('coloniesPlaced', coloniesPlaced, 0);
  assertInteger('feePerColonyCents', feePerColonyCents, 0);
  assertInteger('depositPaidCents', depositPaidCents, 0);
  assertInteger('paymentsCents', paymentsCents, 0);
  const feeCents = coloniesPlaced * feePerColonyCents;
  const lines: InvoiceLine[] = [
    {
      kind: 'fee',
      description: `${coloniesPlaced} colonies × ${(feePerColonyCents / 100).toFixed(2)}`,
      amountCents: feeCents,
    },
  ];
  if (strength) {
    assertInRange('strength.targetAverageFrames', strength.targetAverageFrames, 0, 40);
    assertInRange('strength.measuredAverageFrames', strength.measuredAverageFrames, 0, 40);
    assertInteger('strength.perFramePerColonyCents', strength.perFramePerColonyCents, 0);
    let frames = strength.measuredAverageFrames - strength.targetAverageFrames;
    if (strength.reductionsOnly && frames > 0) frames = 0;
    const amount = roundHalfAwayFromZero(coloniesPlaced * frames * strength.perFramePerColonyCents);
    if (amount !== 0) {
      lines.push({
        kind: 'strength-adjustment',
        description: `average ${strength.measuredAverageFrames.toFixed(2)} frames vs ${strength.targetAverageFrames} target`,
        amountCents: amount,
      });
    }
    const below = strength.coloniesBelowMinimum ?? 0;
    const perColony = strength.belowMinimumReductionCents ?? 0;
    assertInteger('strength.coloniesBelowMinimum', below, 0, coloniesPlaced);
    assertInteger('strength.belowMinimumReductionCents', perColony, 0);
    if (below > 0 && perColony > 0) {
      lines.push({
        kind: 'below-minimum',
        description: `${below} colonies below the minimum`,
        amountCents: -below * perColony,
      });
    }
  }
  const adjustmentsCents = lines.slice(1).reduce((s, l) => s + l.amountCents, 0);
  const totalCents = feeCents + adjustmentsCents;
  return {
    lines,
    feeCents,
    adjustmentsCents,
    totalCents,
    depositPaidCents,
    paymentsCents,
    balanceCents: totalCents - depositPaidCents - paymentsCents,
  };
}
