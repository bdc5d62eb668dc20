/**
 * Splits a whole number into whole parts in proportion to weights by the largest-remainder
 * (Hamilton) method: parts sum exactly to the total, each within one of its exact share.
 * Equal remainders go to the earlier weight, so the result is deterministic.
 */
export function apportion(total: number, weights: readonly number[]): number[] {
  if (!Number.isInteger(total) || total < 0)
    throw new RangeError(`total must be a whole number ≥ 0, got ${total}`);
  if (weights.some((w) => !(w >= 0) || !Number.isFinite(w)))
    throw new RangeError(`weights must be finite and ≥ 0, got ${weights.join(', ')}`);
  const sum = weights.reduce((a, b) => a + b, 0);
  if (weights.length === 0 || total === 0) return weights.map(() => 0);
  if (sum === 0) throw new RangeError(`cannot split ${total} over weights that are all 0`);
  const exact = weights.map((w) => (total * w) / sum);
  const parts = exact.map(Math.floor);
  let left = total - parts.reduce((a, b) => a + b, 0);
  const order = exact
    .map((e, i) => ({ i, remainder: e - Math.floor(e) }))
    .sort((a, b) => b.remainder - a.remainder || a.i - b.i);
  for (const { i } of order) {
    if (left === 0) break;
    parts[i]++;
    left--;
  }
  return parts;
}
