/** An interval [low, high] of output values. */
export interface Interval {
  low: number;
  high: number;
}

/** q = pM if that is an integer, else ⌊pM + ½⌋ (JCGM 101:2008 7.7.1). */
export function coveredCount(sortedLength: number, probability: number): number {
  const product = probability * sortedLength;
  const rounded = Math.round(product);
  return Math.abs(product - rounded) < 1e-9 * Math.max(1, product) ? rounded : Math.floor(product + 0.5);
}

/**
 * Puts in order just what the coverage intervals read: after the call the M − q smallest values sit sorted
 * in values[0 … M−q−1] and the M − q largest sorted in values[q … M−1] (q as in coveredCount).
 * Method: one pass for the smallest and largest value; one pass counting values in C equal cells between them
 * (cell ⌊(y − y_min)·C/(y_max − y_min)⌋); the cells that hold the (M − q)-th smallest and the (M − q)-th largest
 * value fix a low and a high group; one three-way partition pass moves the low group to the front and the high
 * group to the back; the two groups (a little more than M − q values each) are sorted. For p = 0.95 about 10 %
 * of the values are sorted. Falls back to a full sort when the tails would overlap or a value is not finite.
 */
export function orderTails(values: Float64Array, probability: number): void {
  const count = values.length;
  const q = coveredCount(count, probability);
  const tail = count - q;
  if (tail <= 0 || 2 * tail >= count) {
    values.sort();
    return;
  }
  const { smallest, largest } = rangeOf(values);
  const cells = new Int32Array(Math.min(maximumCells, count));
  const cellsPerUnit = cells.length / (largest - smallest);
  if (!Number.isFinite(cellsPerUnit)) {
    values.sort();
    return;
  }
  if (countCells(values, smallest, cellsPerUnit, cells) < count) {
    // A NaN falls in no cell; sort as a whole, as for overlapping tails.
    values.sort();
    return;
  }
  let lowCell = 0;
  for (let below = cells[0]; below < tail; below += cells[lowCell]) lowCell += 1;
  let highCell = cells.length - 1;
  for (let above = cells[highCell]; above < tail; above += cells[highCell]) highCell -= 1;
  if (lowCell >= highCell) {
    values.sort();
    return;
  }
  const { front, back } = partitionByCell(values, smallest, cellsPerUnit, cells.length - 1, lowCell, highCell);
  values.subarray(0, front).sort();
  values.subarray(back, count).sort();
}

/** Cells of the counting pass in orderTails: fine enough that the groups it sorts are barely larger than the tails. */
const maximumCells = 4096;

/** The smallest and the largest value (each hot loop sits in a function of its own, so it is optimised as a whole). */
function rangeOf(values: Float64Array): { smallest: number; largest: number } {
  let smallest = values[0];
  let largest = values[0];
  for (let index = 1; index < values.length; index += 1) {
    const value = values[index];
    if (value < smallest) smallest = value;
    else if (value > largest) largest = value;
  }
  return { smallest, largest };
}

/** cells[k] = number of values with min(C − 1, ⌊(y − y_min)·cellsPerUnit⌋) = k, C the number of cells; returns the number counted. */
function countCells(values: Float64Array, smallest: number, cellsPerUnit: number, cells: Int32Array): number {
  const lastCell = cells.length - 1;
  for (let index = 0; index < values.length; index += 1) {
    cells[Math.min(lastCell, Math.floor((values[index] - smallest) * cellsPerUnit))] += 1;
  }
  let counted = 0;
  for (let cell = 0; cell <= lastCell; cell += 1) counted += cells[cell];
  return counted;
}

/**
 * Dijkstra's three-way partition by cell (as in countCells): afterwards values[0, front) lie in cells ≤ lowCell,
 * values[back, M) in cells ≥ highCell, and the rest between them.
 */
function partitionByCell(
  values: Float64Array,
  smallest: number,
  cellsPerUnit: number,
  lastCell: number,
  lowCell: number,
  highCell: number,
) {
  let front = 0;
  let next = 0;
  let back = values.length;
  while (next < back) {
    const value = values[next];
    const cell = Math.min(lastCell, Math.floor((value - smallest) * cellsPerUnit));
    if (cell <= lowCell) {
      values[next] = values[front];
      values[front] = value;
      front += 1;
      next += 1;
    } else if (cell >= highCell) {
      back -= 1;
      values[next] = values[back];
      values[back] = value;
    } else {
      next += 1;
    }
  }
  return { front, back };
}

/**
 * Probabilistically symmetric coverage interval from sorted (or orderTails-ordered) values (JCGM 101:2008 7.7.2):
 * r = (M − q)/2 if M − q is even, else (M − q + 1)/2; interval [y₍r₎, y₍r+q₎] (1-based).
 */
export function symmetricInterval(sorted: Float64Array, probability: number): Interval {
  const count = sorted.length;
  const q = coveredCount(count, probability);
  const r = (count - q) % 2 === 0 ? (count - q) / 2 : (count - q + 1) / 2;
  const low = Math.max(r, 1);
  return { low: sorted[low - 1], high: sorted[Math.min(low + q, count) - 1] };
}

/** Shortest coverage interval from sorted (or orderTails-ordered) values (JCGM 101:2008 7.7.3): [y₍r*₎, y₍r*+q₎] with r* minimising y₍r+q₎ − y₍r₎ over r = 1…M − q. */
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

/** Mean and standard deviation (divisor M − 1, JCGM 101:2008 7.6) with a shifted two-pass sum for stability. */
export function meanAndStandardDeviation(
  values: Float64Array,
  count = values.length,
): { mean: number; standardDeviation: number } {
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
 * Numerical tolerance of a standard uncertainty (JCGM 101:2008 7.9.2): write u with `significantDigits`
 * significant digits as c × 10^ℓ; δ = ½ × 10^ℓ.
 * @example numericalTolerance(0.835, 2) // 0.005
 */
export function numericalTolerance(standardUncertainty: number, significantDigits: number): number {
  const exponent = Math.floor(Math.log10(standardUncertainty)) - significantDigits + 1;
  return 0.5 * 10 ** exponent;
}
