/**
 * Distribution functions and intervals used by the load plan and strength summaries.
 *
 * Special functions follow Press et al., *Numerical Recipes in C*, 2nd ed. (1992): ln Γ by the
 * Lanczos series (§6.1), the regularized incomplete gamma by series and continued fraction (§6.2),
 * the regularized incomplete beta by Lentz's continued fraction (§6.4). Quantiles are found by
 * bracketing and bisection on the CDF, so they are as accurate as the CDF (about 1e-10).
 */
import { assertFiniteNumber, assertInRange } from './guards';

const MAX_ITERATIONS = 300;
const EPSILON = 3e-16;
const TINY = 1e-300;

/** Natural log of the gamma function for x > 0 (Lanczos, Numerical Recipes §6.1). */
export function logGamma(x: number): number {
  if (!(x > 0)) throw new RangeError(`logGamma needs x > 0, got ${x}`);
  const coefficients = [
    76.18009172947146, -86.50532032941678, 24.01409824083091, -1.231739572450155,
    0.1208650973866179e-2, -0.5395239384953e-5,
  ];
  let y = x;
  let tmp = x + 5.5;
  tmp -= (x + 0.5) * Math.log(tmp);
  let series = 1.000000000190015;
  for (const c of coefficients) series += c / ++y;
  return -tmp + Math.log((2.5066282746310007 * series) / x);
}

/** Regularized lower incomplete gamma P(a, x) (Numerical Recipes §6.2, gser/gcf). */
export function regularizedGammaP(a: number, x: number): number {
  if (!(a > 0) || !(x >= 0))
    throw new RangeError(`regularizedGammaP needs a > 0, x ≥ 0, got a=${a}, x=${x}`);
  if (x === 0) return 0;
  const logPrefix = -x + a * Math.log(x) - logGamma(a);
  if (x < a + 1) {
    let term = 1 / a;
    let sum = term;
    for (let n = 1; n <= MAX_ITERATIONS; n++) {
      term *= x / (a + n);
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * EPSILON) break;
    }
    return sum * Math.exp(logPrefix);
  }
  return 1 - continuedFractionGammaQ(a, x, logPrefix);
}

function continuedFractionGammaQ(a: number, x: number, logPrefix: number): number {
  let b = x + 1 - a;
  let c = 1 / TINY;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i <= MAX_ITERATIONS; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < TINY) d = TINY;
    c = b + an / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPSILON) break;
  }
  return Math.exp(logPrefix) * h;
}

/** Regularized incomplete beta I_x(a, b) for a, b > 0, 0 ≤ x ≤ 1 (Numerical Recipes §6.4). */
export function regularizedIncompleteBeta(x: number, a: number, b: number): number {
  if (!(a > 0) || !(b > 0) || !(x >= 0 && x <= 1)) {
    throw new RangeError(
      `regularizedIncompleteBeta needs a, b > 0 and 0 ≤ x ≤ 1, got x=${x}, a=${a}, b=${b}`,
    );
  }
  if (x === 0 || x === 1) return x;
  const logFront =
    logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(1 - x);
  if (x < (a + 1) / (a + b + 2)) return (Math.exp(logFront) * betaContinuedFraction(x, a, b)) / a;
  return 1 - (Math.exp(logFront) * betaContinuedFraction(1 - x, b, a)) / b;
}

function betaContinuedFraction(x: number, a: number, b: number): number {
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= MAX_ITERATIONS; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPSILON) break;
  }
  return h;
}

/** Standard normal CDF Φ(z), via erfc(x) = Q(½, x²) (Abramowitz & Stegun 7.1.2, 6.5.17). */
export function normalCdf(z: number): number {
  assertFiniteNumber('z', z);
  const x = z / Math.SQRT2;
  const erfcAbs = 1 - regularizedGammaP(0.5, x * x);
  return z >= 0 ? 1 - erfcAbs / 2 : erfcAbs / 2;
}

/** Student t CDF with `degreesOfFreedom` > 0: 1 − ½ I_{ν/(ν+t²)}(ν/2, ½) for t ≥ 0 (A&S 26.7.1). */
export function studentTCdf(t: number, degreesOfFreedom: number): number {
  assertFiniteNumber('t', t);
  if (degreesOfFreedom === Infinity) return normalCdf(t);
  assertInRange('degreesOfFreedom', degreesOfFreedom, Number.MIN_VALUE);
  const tail =
    0.5 *
    regularizedIncompleteBeta(
      degreesOfFreedom / (degreesOfFreedom + t * t),
      degreesOfFreedom / 2,
      0.5,
    );
  return t >= 0 ? 1 - tail : tail;
}

/** Inverts a continuous increasing CDF at p ∈ (0, 1) by bracketing and bisection. */
function invertCdf(cdf: (x: number) => number, p: number): number {
  if (p === 0.5) return 0;
  const sign = p > 0.5 ? 1 : -1;
  const target = sign > 0 ? p : 1 - p;
  let low = 0;
  let high = 1;
  while (cdf(high) < target) {
    low = high;
    high *= 2;
    if (high > 1e300) return sign * Infinity;
  }
  for (let i = 0; i < 200 && high - low > 1e-12 * Math.max(1, high); i++) {
    const mid = (low + high) / 2;
    if (cdf(mid) < target) low = mid;
    else high = mid;
  }
  return sign * ((low + high) / 2);
}

/** Standard normal quantile Φ⁻¹(p) for 0 < p < 1. */
export function normalQuantile(p: number): number {
  assertFiniteNumber('p', p);
  if (!(p > 0 && p < 1)) throw new RangeError(`p must be strictly between 0 and 1, got ${p}`);
  return invertCdf(normalCdf, p);
}

const studentTQuantileCache = new Map<string, number>();

/**
 * Student t quantile t(p, ν): the value with P(T ≤ t) = p for ν ≥ 1 degrees of freedom
 * (ν = Infinity gives the normal quantile). Checked against published t tables in the tests.
 */
export function studentTQuantile(p: number, degreesOfFreedom: number): number {
  assertFiniteNumber('p', p);
  if (!(p > 0 && p < 1)) throw new RangeError(`p must be strictly between 0 and 1, got ${p}`);
  if (degreesOfFreedom !== Infinity) assertInRange('degreesOfFreedom', degreesOfFreedom, 1);
  const key = `${p}|${degreesOfFreedom}`;
  const cached = studentTQuantileCache.get(key);
  if (cached !== undefined) return cached;
  const value =
    degreesOfFreedom === Infinity
      ? normalQuantile(p)
      : invertCdf((t) => studentTCdf(t, degreesOfFreedom), p);
  if (studentTQuantileCache.size > 10_000) studentTQuantileCache.clear();
  studentTQuantileCache.set(key, value);
  return value;
}

/** Arithmetic mean of a non-empty list. */
export function mean(values: readonly number[]): number {
  if (values.length === 0) throw new RangeError('mean needs at least one value, got an empty list');
  let sum = 0;
  for (const v of values) {
    assertFiniteNumber('value', v);
    sum += v;
  }
  return sum / values.length;
}

/** Sample standard deviation (n − 1 denominator) of at least two values. */
export function sampleStandardDeviation(values: readonly number[]): number {
  if (values.length < 2) {
    throw new RangeError(`a standard deviation needs at least 2 values, got ${values.length}`);
  }
  const m = mean(values);
  let squares = 0;
  for (const v of values) squares += (v - m) ** 2;
  return Math.sqrt(squares / (values.length - 1));
}

/** An interval with its lower and upper limits. */
export interface Interval {
  /** Lower limit. */
  lower: number;
  /** Upper limit. */
  upper: number;
}

/** Two-sided t confidence interval of a mean: x̄ ± t(1 − α/2, n − 1) · s / √n. */
export function meanConfidenceInterval(
  sampleMean: number,
  sampleSd: number,
  sampleSize: number,
  confidence = 0.95,
): Interval {
  assertInRange('sampleSize', sampleSize, 2);
  assertInRange('sampleSd', sampleSd, 0);
  assertInRange('confidence', confidence, Number.MIN_VALUE, 1 - Number.EPSILON);
  const halfWidth =
    (studentTQuantile(1 - (1 - confidence) / 2, sampleSize - 1) * sampleSd) / Math.sqrt(sampleSize);
  return { lower: sampleMean - halfWidth, upper: sampleMean + halfWidth };
}

/**
 * Wilson score interval of a proportion (Wilson 1927; Agresti & Coull 1998):
 * (p̂ + z²/2n ± z √(p̂(1 − p̂)/n + z²/4n²)) / (1 + z²/n).
 */
export function wilsonInterval(successes: number, trials: number, confidence = 0.95): Interval {
  assertInRange('trials', trials, 1);
  assertInRange('successes', successes, 0, trials);
  assertInRange('confidence', confidence, Number.MIN_VALUE, 1 - Number.EPSILON);
  const z = normalQuantile(1 - (1 - confidence) / 2);
  const share = successes / trials;
  const z2n = (z * z) / trials;
  const centre = (share + z2n / 2) / (1 + z2n);
  const halfWidth =
    (z * Math.sqrt((share * (1 - share)) / trials + (z * z) / (4 * trials * trials))) / (1 + z2n);
  return { lower: Math.max(0, centre - halfWidth), upper: Math.min(1, centre + halfWidth) };
}
