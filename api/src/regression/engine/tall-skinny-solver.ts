/**
 * Least squares for tall designs (many rows, few columns). Well-conditioned designs (cond <= 1e2 after
 * centring and scaling) take the Gram path: one symmetric pass accumulating the Gram matrix of the working
 * design, its Cholesky factor, and one step of refinement against the data. The others take a blocked
 * tall-skinny QR that never stores
 * Q and never copies the data: rows are taken in blocks of BLOCK_ROWS, turned into centred and scaled
 * working rows (see working-design.ts) in a small column-major buffer, and folded into the running
 * triangular factor R by Householder reflections of the stacked matrix [R; block] (the sequential form of
 * TSQR: Demmel, Grigori, Hoemmen & Langou, 2012, "Communication-optimal parallel and sequential QR and LU
 * factorizations", SIAM J. Sci. Comput. 34). The response, centred and scaled the same way, rides along
 * as an extra column, so the last column of R holds Q'y.
 *
 * This is as backward stable as Householder QR on the whole matrix, so for well-conditioned designs the
 * coefficients are accurate to about cond x 1e-16. When the estimated condition number exceeds
 * REFINE_ABOVE_CONDITION the problem is handed to the double-double refined solver
 * (refined-qr-solver.ts), which copies the working design but keeps full accuracy.
 */

import { householderFactorise } from './householder-qr';
import { collinearityError, mappedCovariance, RefinedSolution, solveRefinedQr } from './refined-qr-solver';
import { frobeniusConditionNumber, inverseGram, upperInverse } from './triangular';
import { toDesignCoefficients, weightedMean, WorkingDesign } from './working-design';

const BLOCK_ROWS = 128;
/** Above this condition number the double-double refined solver takes over. */
export const REFINE_ABOVE_CONDITION = 1e4;
/** The Gram (Cholesky) factor is used only up to this condition number of the working design: the
 * covariance then comes from a factor accurate to about cond^2 x 1e-16 = 1e-12 relative. */
export const GRAM_MAX_CONDITION = 1e2;
const GRAM_REFINEMENT_STEPS = 1;

export function solveTallSkinny(design: WorkingDesign, response: Float64Array, computeLeverage: boolean): RefinedSolution {
  const { p } = design;
  const width = p + 1;
  const { shift: responseShift, inverseScale: responseInverse } = responseScaling(design, response);
  // Fast path first: the Gram matrix of the working design (one symmetric pass, about a quarter of the
  // Householder work) and its Cholesky factor, accepted only when the factor is well conditioned; the
  // coefficients are then refined against the data. Otherwise the Householder fold below.
  const gram = gramTriangle(design, response, responseShift, responseInverse);
  const viaGram = gram !== null && frobeniusConditionNumber(leadingFactor(gram, width, p)) <= GRAM_MAX_CONDITION;
  const triangle = viaGram ? (gram as Float64Array) : householderTriangle(design, response, responseShift, responseInverse);

  // Rank check on R's leading p columns, with the same test as the Householder path.
  const columns: Float64Array[] = [];
  for (let j = 0; j < p; j++) {
    const column = new Float64Array(p);
    for (let i = 0; i <= j; i++) column[i] = triangle[i * width + j]!;
    columns.push(column);
  }
  const check = householderFactorise(columns, p, design.rankTolerance, design.offsetRatio);
  if ('failure' in check) throw collinearityError(design, check.failure.column, check.failure.dependency);

  const rFactor = new Float64Array(p * p);
  for (let i = 0; i < p; i++) for (let j = i; j < p; j++) rFactor[i * p + j] = triangle[i * width + j]!;
  const upper = { size: p, entries: rFactor };
  const conditionNumber = frobeniusConditionNumber(upper);
  if (conditionNumber > REFINE_ABOVE_CONDITION) return solveRefinedQr(design, response, computeLeverage);

  // g = R^-1 (Q'y), in working units; y's shift belongs to the intercept, its scale to every g_j.
  const g = new Float64Array(p);
  for (let i = p - 1; i >= 0; i--) {
    let sum = triangle[i * width + p]!;
    for (let j = i + 1; j < p; j++) sum -= rFactor[i * p + j]! * g[j]!;
    g[i] = sum / rFactor[i * p + i]!;
  }
  let refinementSteps = 0;
  if (viaGram) {
    for (; refinementSteps < GRAM_REFINEMENT_STEPS; refinementSteps++) {
      refineWorkingSolution(design, response, responseShift, responseInverse, rFactor, g);
    }
  }
  const scaleBack = 1 / responseInverse;
  for (let j = 0; j < p; j++) g[j]! *= scaleBack;
  if (design.interceptIndex >= 0) g[design.interceptIndex]! += responseShift / design.inverseScale[design.interceptIndex]!;
  const mapped = toDesignCoefficients(design, g, new Float64Array(p));
  const coefficients = new Float64Array(p);
  for (let j = 0; j < p; j++) coefficients[j] = mapped.hi[j]! + mapped.lo[j]!;

  const { fitted, residuals, weightedSquares } = residualPass(design, response, g);
  const inverse = upperInverse(upper);
  const workingCovariance = inverseGram(inverse);
  const solution: RefinedSolution = {
    coefficients,
    residuals,
    fitted,
    residualSumOfSquares: weightedSquares,
    unscaledCovariance: mappedCovariance(design, workingCovariance, null),
    conditionNumber,
    refinementSteps,
    solver: 'tall-skinny',
    workingCoefficients: g,
    workingCoefficientsLow: new Float64Array(p),
    workingCovariance,
    workingCovarianceLow: null,
  };
  if (computeLeverage) solution.leverage = leverageFromInverse(design, inverse);
  return solution;
}

/**
 * The Householder fold: R of [A | S y] by sequential TSQR over blocks of rows (row-major, width x width).
 */
function householderTriangle(design: WorkingDesign, response: Float64Array, responseShift: number, responseInverse: number): Float64Array {
  const { n, p } = design;
  const width = p + 1;
  const triangle = new Float64Array(width * width);
  const block = new Float64Array(BLOCK_ROWS * width);
  for (let start = 0; start < n; start += BLOCK_ROWS) {
    const rows = Math.min(BLOCK_ROWS, n - start);
    fillBlock(design, response, responseShift, responseInverse, start, rows, block);
    foldBlock(triangle, width, block, rows);
  }
  return triangle;
}

/**
 * R of [A | S y] from the Cholesky factor of its Gram matrix (row-major upper triangle), or null when the
 * leading p x p part is not numerically positive definite. Squaring the condition number is why the
 * caller accepts this factor only when it is well conditioned (GRAM_MAX_CONDITION) and refines the
 * coefficients against the data afterwards (refineWorkingSolution).
 */
function gramTriangle(design: WorkingDesign, response: Float64Array, responseShift: number, responseInverse: number): Float64Array | null {
  const { n, p } = design;
  const width = p + 1;
  const gram = new Float64Array(width * width);
  const block = new Float64Array(BLOCK_ROWS * width);
  for (let start = 0; start < n; start += BLOCK_ROWS) {
    const rows = Math.min(BLOCK_ROWS, n - start);
    fillBlock(design, response, responseShift, responseInverse, start, rows, block);
    accumulateGram(gram, width, block, rows);
  }
  for (let k = 0; k < width; k++) {
    let diagonal = gram[k * width + k]!;
    for (let m = 0; m < k; m++) diagonal -= gram[m * width + k]! * gram[m * width + k]!;
    if (k === p) {
      // The response's own pivot is the residual norm: rounding may take it below zero for a perfect fit.
      gram[k * width + k] = Math.sqrt(Math.max(diagonal, 0));
      break;
    }
    if (!(diagonal > 0)) return null;
    const pivot = Math.sqrt(diagonal);
    gram[k * width + k] = pivot;
    for (let j = k + 1; j < width; j++) {
      let value = gram[k * width + j]!;
      for (let m = 0; m < k; m++) value -= gram[m * width + k]! * gram[m * width + j]!;
      gram[k * width + j] = value / pivot;
    }
  }
  return gram;
}

/** Upper triangle of the block's Gram matrix added into `gram` (row-major); four columns share each load. */
function accumulateGram(gram: Float64Array, width: number, block: Float64Array, rows: number): void {
  for (let i = 0; i < width; i++) {
    const a = i * BLOCK_ROWS;
    let j = i;
    for (; j + 3 < width; j += 4) {
      const b0 = j * BLOCK_ROWS;
      const b1 = b0 + BLOCK_ROWS;
      const b2 = b1 + BLOCK_ROWS;
      const b3 = b2 + BLOCK_ROWS;
      let s0 = 0;
      let s1 = 0;
      let s2 = 0;
      let s3 = 0;
      for (let r = 0; r < rows; r++) {
        const v = block[a + r]!;
        s0 += v * block[b0 + r]!;
        s1 += v * block[b1 + r]!;
        s2 += v * block[b2 + r]!;
        s3 += v * block[b3 + r]!;
      }
      gram[i * width + j]! += s0;
      gram[i * width + j + 1]! += s1;
      gram[i * width + j + 2]! += s2;
      gram[i * width + j + 3]! += s3;
    }
    for (; j < width; j++) {
      const b = j * BLOCK_ROWS;
      let sum = 0;
      for (let r = 0; r < rows; r++) sum += block[a + r]! * block[b + r]!;
      gram[i * width + j]! += sum;
    }
  }
}

function leadingFactor(triangle: Float64Array, width: number, p: number) {
  const entries = new Float64Array(p * p);
  for (let i = 0; i < p; i++) for (let j = i; j < p; j++) entries[i * p + j] = triangle[i * width + j]!;
  return { size: p, entries };
}

/**
 * One step of iterative refinement of the seminormal equations R'R g = A'(S y): r = S y - A g and
 * g += (R'R)^-1 A'r, all in working units (Björck, Numerical Methods for Least Squares Problems, 1996,
 * section 2.9.3). Each step shrinks the error by about cond(A)^2 x 1e-16 (at most 1e-12 here, since
 * cond <= 1e2), so one step brings the coefficients to the accuracy of the Householder path.
 */
function refineWorkingSolution(
  design: WorkingDesign,
  response: Float64Array,
  responseShift: number,
  responseInverse: number,
  rFactor: Float64Array,
  g: Float64Array,
): void {
  const { n, p } = design;
  const width = p + 1;
  const correction = new Float64Array(p);
  const block = new Float64Array(BLOCK_ROWS * width);
  const residual = new Float64Array(BLOCK_ROWS);
  for (let start = 0; start < n; start += BLOCK_ROWS) {
    const rows = Math.min(BLOCK_ROWS, n - start);
    fillBlock(design, response, responseShift, responseInverse, start, rows, block);
    residual.set(block.subarray(p * BLOCK_ROWS, p * BLOCK_ROWS + rows));
    for (let j = 0; j < p; j++) {
      const offset = j * BLOCK_ROWS;
      const coefficient = g[j]!;
      for (let r = 0; r < rows; r++) residual[r]! -= block[offset + r]! * coefficient;
    }
    for (let j = 0; j < p; j++) {
      const offset = j * BLOCK_ROWS;
      let sum = 0;
      for (let r = 0; r < rows; r++) sum += block[offset + r]! * residual[r]!;
      correction[j]! += sum;
    }
  }
  // R' t = c (forward), then R d = t (backward).
  for (let i = 0; i < p; i++) {
    let value = correction[i]!;
    for (let m = 0; m < i; m++) value -= rFactor[m * p + i]! * correction[m]!;
    correction[i] = value / rFactor[i * p + i]!;
  }
  for (let i = p - 1; i >= 0; i--) {
    let value = correction[i]!;
    for (let j = i + 1; j < p; j++) value -= rFactor[i * p + j]! * correction[j]!;
    correction[i] = value / rFactor[i * p + i]!;
  }
  for (let j = 0; j < p; j++) g[j]! += correction[j]!;
}

/** Shift and power-of-two scale for the response column, as for a predictor. */
function responseScaling(design: WorkingDesign, response: Float64Array): { shift: number; inverseScale: number } {
  const { n, sqrtWeights } = design;
  let shift = 0;
  if (design.interceptIndex >= 0) {
    if (sqrtWeights) {
      const weights = new Float64Array(n);
      let total = 0;
      for (let i = 0; i < n; i++) {
        weights[i] = sqrtWeights[i]! * sqrtWeights[i]!;
        total += weights[i]!;
      }
      shift = weightedMean(response, weights, total, n);
    } else shift = weightedMean(response, undefined, n, n);
  }
  let squares = 0;
  for (let i = 0; i < n; i++) {
    const d = (response[i]! - shift) * (sqrtWeights ? sqrtWeights[i]! : 1);
    squares += d * d;
  }
  const norm = Math.sqrt(squares);
  const inverseScale = norm > 0 ? Math.pow(2, -Math.round(Math.log2(norm))) : 1;
  return { shift, inverseScale };
}

function fillBlock(
  design: WorkingDesign,
  response: Float64Array,
  responseShift: number,
  responseInverse: number,
  start: number,
  rows: number,
  block: Float64Array,
): void {
  const { p, sqrtWeights, interceptIndex } = design;
  for (let j = 0; j < p; j++) {
    const offset = j * BLOCK_ROWS;
    const inverse = design.inverseScale[j]!;
    if (j === interceptIndex) {
      for (let i = 0; i < rows; i++) block[offset + i] = sqrtWeights ? sqrtWeights[start + i]! * inverse : inverse;
      continue;
    }
    const column = design.columns[j] as Float64Array;
    const low = design.lowParts[j];
    const m = design.shift[j]!;
    if (low) for (let i = 0; i < rows; i++) block[offset + i] = (column[start + i]! - m + low[start + i]!) * inverse;
    else for (let i = 0; i < rows; i++) block[offset + i] = (column[start + i]! - m) * inverse;
    if (sqrtWeights) for (let i = 0; i < rows; i++) block[offset + i]! *= sqrtWeights[start + i]!;
  }
  const offset = p * BLOCK_ROWS;
  for (let i = 0; i < rows; i++) block[offset + i] = (response[start + i]! - responseShift) * responseInverse;
  if (sqrtWeights) for (let i = 0; i < rows; i++) block[offset + i]! *= sqrtWeights[start + i]!;
}

/**
 * Householder QR of [R; block] (R upper triangular, width x width, row-major; block rows x width,
 * column-major with stride BLOCK_ROWS). Reflection k touches row k of R and column k of the block only.
 * The reflection is applied to four columns at a time with two partial sums each, which shares the
 * loads of v and breaks the floating-point dependency chains (about 1.8x faster than one column at a
 * time in V8); the arithmetic is the same Householder update.
 */
function foldBlock(triangle: Float64Array, width: number, block: Float64Array, rows: number): void {
  const evenRows = rows & ~1;
  const rowsByFour = rows & ~3;
  for (let k = 0; k < width; k++) {
    const v = k * BLOCK_ROWS;
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    let s3 = 0;
    let i = 0;
    for (; i < rowsByFour; i += 4) {
      const a = block[v + i]!;
      const b = block[v + i + 1]!;
      const c = block[v + i + 2]!;
      const d = block[v + i + 3]!;
      s0 += a * a;
      s1 += b * b;
      s2 += c * c;
      s3 += d * d;
    }
    for (; i < rows; i++) s0 += block[v + i]! * block[v + i]!;
    const sigma = s0 + s1 + (s2 + s3);
    if (sigma === 0) continue;
    const kw = k * width;
    const alpha = triangle[kw + k]!;
    const norm = Math.sqrt(alpha * alpha + sigma);
    const beta = alpha > 0 ? -norm : norm;
    const tau = (beta - alpha) / beta;
    const inverseHead = 1 / (alpha - beta); // v = [1; block column k / (alpha - beta)]
    for (i = 0; i < rows; i++) block[v + i]! *= inverseHead;
    triangle[kw + k] = beta;
    let j = k + 1;
    for (; j + 3 < width; j += 4) {
      const p = j * BLOCK_ROWS;
      const q = p + BLOCK_ROWS;
      const r = q + BLOCK_ROWS;
      const t = r + BLOCK_ROWS;
      let a0 = 0;
      let b0 = 0;
      let c0 = 0;
      let d0 = 0;
      let a1 = 0;
      let b1 = 0;
      let c1 = 0;
      let d1 = 0;
      for (i = 0; i < evenRows; i += 2) {
        const v0 = block[v + i]!;
        const v1 = block[v + i + 1]!;
        a0 += v0 * block[p + i]!;
        b0 += v0 * block[q + i]!;
        c0 += v0 * block[r + i]!;
        d0 += v0 * block[t + i]!;
        a1 += v1 * block[p + i + 1]!;
        b1 += v1 * block[q + i + 1]!;
        c1 += v1 * block[r + i + 1]!;
        d1 += v1 * block[t + i + 1]!;
      }
      for (; i < rows; i++) {
        const v0 = block[v + i]!;
        a0 += v0 * block[p + i]!;
        b0 += v0 * block[q + i]!;
        c0 += v0 * block[r + i]!;
        d0 += v0 * block[t + i]!;
      }
      const sp = tau * (triangle[kw + j]! + a0 + a1);
      const sq = tau * (triangle[kw + j + 1]! + b0 + b1);
      const sr = tau * (triangle[kw + j + 2]! + c0 + c1);
      const st = tau * (triangle[kw + j + 3]! + d0 + d1);
      triangle[kw + j]! -= sp;
      triangle[kw + j + 1]! -= sq;
      triangle[kw + j + 2]! -= sr;
      triangle[kw + j + 3]! -= st;
      for (i = 0; i < rows; i++) {
        const v0 = block[v + i]!;
        block[p + i]! -= sp * v0;
        block[q + i]! -= sq * v0;
        block[r + i]! -= sr * v0;
        block[t + i]! -= st * v0;
      }
    }
    for (; j < width; j++) {
      const p = j * BLOCK_ROWS;
      let a0 = 0;
      let a1 = 0;
      for (i = 0; i < evenRows; i += 2) {
        a0 += block[v + i]! * block[p + i]!;
        a1 += block[v + i + 1]! * block[p + i + 1]!;
      }
      for (; i < rows; i++) a0 += block[v + i]! * block[p + i]!;
      const sp = tau * (triangle[kw + j]! + a0 + a1);
      triangle[kw + j]! -= sp;
      for (i = 0; i < rows; i++) block[p + i]! -= sp * block[v + i]!;
    }
  }
}

/**
 * Fitted values from the centred form yhat_i = k + sum_j b_j (x_ij - m_j), k = g_0 / c_0 (the level at
 * the means), which avoids cancelling a large intercept against large x_ij b_j. Rows in cache-sized blocks.
 */
function residualPass(
  design: WorkingDesign,
  response: Float64Array,
  workingCoefficients: Float64Array,
): { fitted: Float64Array; residuals: Float64Array; weightedSquares: number } {
  const { n, p, sqrtWeights, interceptIndex } = design;
  const level = interceptIndex >= 0 ? workingCoefficients[interceptIndex]! * design.inverseScale[interceptIndex]! : 0;
  const fitted = new Float64Array(n);
  const residuals = new Float64Array(n);
  let weightedSquares = 0;
  const chunk = 2048;
  for (let start = 0; start < n; start += chunk) {
    const end = Math.min(n, start + chunk);
    for (let i = start; i < end; i++) fitted[i] = level;
    let pending: number[] = [];
    const flush = () => {
      // four columns per sweep: one load and store of fitted[i] instead of four
      while (pending.length > 0) {
        const group = pending.splice(0, 4);
        if (group.length === 4) {
          const [j0, j1, j2, j3] = group as [number, number, number, number];
          const c0 = design.columns[j0] as Float64Array;
          const c1 = design.columns[j1] as Float64Array;
          const c2 = design.columns[j2] as Float64Array;
          const c3 = design.columns[j3] as Float64Array;
          const b0 = workingCoefficients[j0]! * design.inverseScale[j0]!;
          const b1 = workingCoefficients[j1]! * design.inverseScale[j1]!;
          const b2 = workingCoefficients[j2]! * design.inverseScale[j2]!;
          const b3 = workingCoefficients[j3]! * design.inverseScale[j3]!;
          const m0 = design.shift[j0]!;
          const m1 = design.shift[j1]!;
          const m2 = design.shift[j2]!;
          const m3 = design.shift[j3]!;
          for (let i = start; i < end; i++) {
            fitted[i]! += b0 * (c0[i]! - m0) + b1 * (c1[i]! - m1) + (b2 * (c2[i]! - m2) + b3 * (c3[i]! - m3));
          }
        } else {
          for (const j of group) {
            const b = workingCoefficients[j]! * design.inverseScale[j]!;
            const m = design.shift[j]!;
            const column = design.columns[j] as Float64Array;
            for (let i = start; i < end; i++) fitted[i]! += b * (column[i]! - m);
          }
        }
      }
    };
    for (let j = 0; j < p; j++) {
      if (j === interceptIndex) continue;
      const low = design.lowParts[j];
      if (low) {
        const b = workingCoefficients[j]! * design.inverseScale[j]!;
        const m = design.shift[j]!;
        const column = design.columns[j] as Float64Array;
        for (let i = start; i < end; i++) fitted[i]! += b * (column[i]! - m + low[i]!);
      } else pending.push(j);
    }
    flush();
    pending = [];
    let block = 0;
    if (sqrtWeights) {
      for (let i = start; i < end; i++) {
        const r = response[i]! - fitted[i]!;
        residuals[i] = r;
        const sr = sqrtWeights[i]! * r;
        block += sr * sr;
      }
    } else {
      for (let i = start; i < end; i++) {
        const r = response[i]! - fitted[i]!;
        residuals[i] = r;
        block += r * r;
      }
    }
    weightedSquares += block;
  }
  return { fitted, residuals, weightedSquares };
}

/** h_i = || R^-T a_i ||^2 for each working row a_i. */
function leverageFromInverse(design: WorkingDesign, inverse: Float64Array): Float64Array {
  const { n, p, sqrtWeights, interceptIndex } = design;
  const leverage = new Float64Array(n);
  const row = new Float64Array(p);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < p; j++) {
      const inverseScale = design.inverseScale[j]!;
      let value =
        j === interceptIndex
          ? inverseScale
          : ((design.columns[j] as Float64Array)[i]! - design.shift[j]!) * inverseScale;
      if (sqrtWeights) value *= sqrtWeights[i]!;
      row[j] = value;
    }
    let sum = 0;
    for (let k = 0; k < p; k++) {
      // (R^-T a)_k = sum_{j <= k} Rinv[j][k] a_j
      let component = 0;
      for (let j = 0; j <= k; j++) component += inverse[j * p + k]! * row[j]!;
      sum += component * component;
    }
    leverage[i] = sum;
  }
  return leverage;
}
