/**
 * Updating cross-product sums for a sliding window of rows: the cost of moving the window is
 * O(step * m^2) for m variables, independent of the window length.
 *
 * Sums are kept about an anchor a (the mean of the window at the last recomputation): s1 = sum (z - a),
 * s2 = sum (z - a)(z - a)'. Centred co-moments are then s2 - s1 s1' / count, and because a stays close
 * to the window's mean the subtraction loses little (the shifted-data algorithm; Chan, Golub & LeVeque
 * 1983, The American Statistician 37(3), 242-247). Adding and removing rows accumulates rounding, so
 * the sums are recomputed from scratch, with a fresh anchor, every `recomputeInterval` moves, which
 * keeps the amortised cost per move unchanged when the interval is about window / step.
 * Without an intercept the anchor is 0 and raw cross-products are kept.
 */

export class WindowMoments {
  readonly size: number;
  readonly anchor: Float64Array;
  readonly first: Float64Array;
  /** Row-major size x size. */
  readonly second: Float64Array;
  count = 0;
  private readonly row: Float64Array;

  constructor(
    private readonly variables: Float64Array[],
    private readonly centred: boolean,
  ) {
    this.size = variables.length;
    this.anchor = new Float64Array(this.size);
    this.first = new Float64Array(this.size);
    this.second = new Float64Array(this.size * this.size);
    this.row = new Float64Array(this.size);
  }

  /** Sums of rows [start, end) from scratch, anchored at their mean (centred) or at 0. */
  recompute(start: number, end: number): void {
    const { size, variables, anchor, first, second } = this;
    const count = end - start;
    for (let j = 0; j < size; j++) {
      let mean = 0;
      if (this.centred) {
        const column = variables[j] as Float64Array;
        for (let i = start; i < end; i++) mean += column[i]!;
        mean /= count;
      }
      anchor[j] = mean;
    }
    first.fill(0);
    second.fill(0);
    this.count = 0;
    for (let i = start; i < end; i++) this.add(i);
  }

  add(i: number): void {
    this.update(i, 1);
  }

  remove(i: number): void {
    this.update(i, -1);
  }

  private update(i: number, sign: 1 | -1): void {
    const { size, variables, anchor, first, second, row } = this;
    for (let j = 0; j < size; j++) row[j] = (variables[j] as Float64Array)[i]! - anchor[j]!;
    for (let j = 0; j < size; j++) {
      const value = sign * row[j]!;
      first[j]! += value;
      const offset = j * size;
      for (let k = j; k < size; k++) second[offset + k]! += value * row[k]!;
    }
    this.count += sign;
  }

  /** Centred co-moment (or raw cross-product) of variables j <= k over the current window. */
  moment(j: number, k: number): number {
    const a = Math.min(j, k);
    const b = Math.max(j, k);
    const raw = this.second[a * this.size + b]!;
    if (!this.centred) return raw;
    return raw - (this.first[a]! * this.first[b]!) / this.count;
  }

  /** Window mean of variable j (centred mode). */
  mean(j: number): number {
    return this.anchor[j]! + this.first[j]! / this.count;
  }
}
