/** An interval [low, high] of output values. */
export interface Interval {
  low: number;
  high: number;
}

/** q = pM if that is an integer, else ⌊pM + ½⌋ (JCGM 101 7.7.1). */
export function coveredCount(sortedLength: number, probability: number): number {
  const product = probability * sortedLength;
  const rounded = Math.round(product);
  return Math.abs(product - rounded) < 1e-9 * Math.max(1, product) ? rounded : Math.floor(product + 0.5);
}

/**
 * Puts in order just what the coverage intervals read: after the call the M − q smallest values sit sorted
 * in values[0 … M−q−1] and the M − q largest sorted in values[q … M−1] (q as in coveredCount). Two
 * quickselect partitions and two small sorts replace a full sort (for p = 0.95 only 10 % of the values are
 * sorted). Falls back to a full sort when the tails would overlap.
 */
export function orderTails(values: Float64Array, probability: number): void {
  const count = values.length;
  const q = coveredCount(count, probability);
  const tail = count - q;
  if (tail <= 0 || 2 * tail >= count) {
    values.sort();
    return;
  }
  selectInPlace(values, tail - 1, 0, count - 1);
  selectInPlace(values, q, tail, count - 1);
  values.subarray(0, tail).sort();
  values.subarray(q, count).sort();
}

/** Quickselect (Hoare partition, median-of-three pivot): afterwards values[k] is the (k+1)-th smallest of [left, right], smaller ones before it, larger after. */
function selectInPlace(values: Float64Array, k: number, left: number, right: number): void {
  let low = left;
  let high = right;
  while (high > low) {
    const middle = (low + high) >>> 1;
    const a = values[low];
    const b = values[middle];
    const c = values[high];
    const pivot = a < b ? (b < c ? b : a < c ? c : a) : a < c ? a : b < c ? c : b;
    let i = low;
    let j = high;
    while (i <= j) {
      while (values[i] < pivot) i += 1;
      while (values[j] > pivot) j -= 1;
      if (i <= j) {
        const swap = values[i];
        values[i] = values[j];
        values[j] = swap;
        i += 1;
        j -= 1;
      }
    }
    if (k <= j) high = j;
    else if (k >= i) low = i;
    else return;
  }
}

/**
 * Probabilistically symmetric coverage interval from sorted (or orderTails-ordered) values (JCGM 101 7.7.2):
 * r = (M − q)/2 if M − q is even, else (M − q + 1)/2; interval [y₍r₎, y₍r+q₎] (1-based).
 */
export function symmetricInterval(sorted: Float64Array, probability: number): Interval {
  const count = sorted.length;
  const q = coveredCount(count, probability);
  const r = (count - q) % 2 === 0 ? (count - q) / 2 : (count - q + 1) / 2;
  const low = Math.max(r, 1);
  return { low: sorted[low - 1], high: sorted[Math.min(low + q, count) - 1] };
}

/** Shortest coverage interval from sorted (or orderTails-ordered) values (JCGM 101 7.7.3): [y₍r*₎, y₍r*+q₎] with r* minimising y₍r+q₎ − y₍r₎ over r = 1…M − q. */
export function shortestInterval(sorted: Float64Array, probability: number): Interval {
  const count = sorted.length;
  const q = Math.min(coveredCount(count, probability), count - 1);
  let best = 0;
  let bestWidth = Infinity;
  for (let r = 0; r + q < count; r += 1) {
    const width = sorted[r + q] - sorted[r];
    if (width < bestWidth) {
      bestWidth = width;
      best = r;
    }
  }
  return { low: sorted[best], high: sorted[best + q] };
}

/** Counts of values in `bins` equal bins from the smallest to the largest value. */
export interface Histogram {
  lowerEdge: number;
  binWidth: number;
  counts: number[];
}

/** Histogram of values whose smallest is values[0] and largest values[M − 1] (sorted or orderTails-ordered). */
export function histogram(sorted: Float64Array, bins: number): Histogram {
  const lowerEdge = sorted[0];
  const span = sorted[sorted.length - 1] - lowerEdge;
  const binWidth = span > 0 ? span / bins : 1;
  const counts = new Array<number>(bins).fill(0);
  for (let index = 0; index < sorted.length; index += 1) {
    counts[Math.min(bins - 1, Math.floor((sorted[index] - lowerEdge) / binWidth))] += 1;
  }
  return { lowerEdge, binWidth, counts };
}

/** Mean and standard deviation (divisor M − 1, JCGM 101 7.6) with a shifted two-pass sum for stability. */
export function meanAndStandardDeviation(values: Float64Array, count = values.length): { mean: number; standardDeviation: number } {
  let sum = 0;
  for (let index = 0; index < count; index += 1) sum += values[index];
  const mean = sum / count;
  let squares = 0;
  let residual = 0;
  for (let index = 0; index < count; index += 1) {
    const deviation = values[index] - mean;
    squares += deviation * deviation;
    residual += deviation;
  }
  const variance = count > 1 ? (squares - (residual * residual) / count) / (count - 1) : 0;
  return { mean, standardDeviation: Math.sqrt(Math.max(variance, 0)) };
}

/**
 * Numerical tolerance of a standard uncertainty (JCGM 101 7.9.2): write u with `significantDigits`
 * significant digits as c × 10^ℓ; δ = ½ × 10^ℓ.
 * @example numericalTolerance(0.835, 2) // 0.005
 */
export function numericalTolerance(standardUncertainty: number, significantDigits: number): number {
  const exponent = Math.floor(Math.log10(standardUncertainty)) - significantDigits + 1;
  return 0.5 * 10 ** exponent;
}
