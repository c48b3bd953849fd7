/**
 * Property tests (fast-check): identities every least-squares fit must satisfy, whatever the data.
 *  - with an intercept, residuals sum to zero (normal equation for the ones column);
 *  - R² lies in [0, 1];
 *  - permuting rows changes nothing;
 *  - rescaling x by c divides its slope by c; rescaling y by c multiplies every coefficient by c.
 * Tolerances are relative to the data's scale (a few thousand machine epsilons), common practice for
 * floating-point identities.
 */
import { EngineError } from './errors';
import fc from 'fast-check';
import { fitModel } from './fit-model';
import { FitResult } from './fit-model';

// A fixed seed keeps CI reproducible; change it locally to explore other draws.
fc.configureGlobal({ seed: 20261202 });

const finite = fc.double({ min: -1e3, max: 1e3, noNaN: true, noDefaultInfinity: true });

/** Rows of (x1, x2, y) with enough spread that the design has full rank. */
const dataset = fc
  .array(fc.tuple(finite, finite, finite), { minLength: 6, maxLength: 60 })
  .filter((rows) => {
    const spread = (k: 0 | 1 | 2) => Math.max(...rows.map((r) => r[k])) - Math.min(...rows.map((r) => r[k]));
    // At least four distinct rows: fewer leave a design that is singular up to rounding.
    const distinct = new Set(rows.map((row) => row.join(','))).size;
    return distinct >= 4 && spread(0) > 1e-3 && spread(1) > 1e-3 && spread(2) > 1e-3;
  });

function fit(rows: [number, number, number][], predictors: string[] = ['x1', 'x2']): FitResult | null {
  try {
    return fitModel({
      columns: { x1: rows.map((r) => r[0]), x2: rows.map((r) => r[1]), y: rows.map((r) => r[2]) },
      response: 'y',
      predictors,
      includeObservations: true,
    });
  } catch (error) {
    if (error instanceof EngineError) return null; // collinear draws are rejected; the properties concern successful fits
    throw error;
  }
}

const close = (a: number, b: number, scale: number) => Math.abs(a - b) <= 1e-9 * Math.max(scale, 1e-300);

describe('least-squares identities (fast-check)', () => {
  it('residuals sum to zero with an intercept', () => {
    fc.assert(
      fc.property(dataset, (rows) => {
        const result = fit(rows);
        if (!result) return;
        const residuals = result.observations!.residuals;
        const sum = residuals.reduce((a, b) => a + b, 0);
        const scale = rows.reduce((a, r) => a + Math.abs(r[2]), 0);
        expect(Math.abs(sum)).toBeLessThanOrEqual(1e-11 * scale);
      }),
      { numRuns: 150 },
    );
  });

  it('R² lies in [0, 1]', () => {
    fc.assert(
      fc.property(dataset, fc.boolean(), (rows, intercept) => {
        let result: FitResult;
        try {
          result = fitModel({
            columns: { x1: rows.map((r) => r[0]), y: rows.map((r) => r[2]) },
            response: 'y',
            predictors: ['x1'],
            intercept,
          });
        } catch (error) {
          // Only the engine's own rejections of a draw (a constant column, say) are skipped.
          if (error instanceof EngineError) return;
          throw error;
        }
        expect(result.rSquared).toBeGreaterThanOrEqual(0);
        expect(result.rSquared).toBeLessThanOrEqual(1);
      }),
      { numRuns: 150 },
    );
  });

  it('results do not depend on row order', () => {
    fc.assert(
      fc.property(dataset, fc.integer({ min: 1, max: 1000 }), (rows, seed) => {
        const shuffled = rows
          .map((row, index) => ({ row, key: (index * 7919 + seed * 104729) % 1000003 }))
          .sort((a, b) => a.key - b.key)
          .map((entry) => entry.row);
        const first = fit(rows);
        const second = fit(shuffled);
        if (!first || !second) return;
        first.coefficients.forEach((c, j) => {
          const other = second.coefficients[j]!;
          const scale = Math.abs(c.estimate) + c.standardError;
          expect(close(c.estimate, other.estimate, scale)).toBe(true);
          expect(close(c.standardError, other.standardError, c.standardError)).toBe(true);
        });
        expect(close(first.rSquared, second.rSquared, 1)).toBe(true);
      }),
      { numRuns: 100 },
    );
  });

  it('rescaling x by c divides its slope by c; rescaling y by c multiplies the coefficients by c', () => {
    fc.assert(
      fc.property(dataset, fc.constantFrom(1e-3, 0.5, 3, 1e4), (rows, c) => {
        const base = fit(rows);
        const xScaled = fit(rows.map(([a, b, y]) => [a * c, b, y]));
        const yScaled = fit(rows.map(([a, b, y]) => [a, b, y * c]));
        if (!base || !xScaled || !yScaled) return;
        // Natural unit of each coefficient: range of y over range of its column (1 for the intercept's
        // column of ones), so that coefficients that are zero to rounding are compared sensibly.
        const range = (k: 0 | 1 | 2) => Math.max(...rows.map((r) => Math.abs(r[k])));
        const units = [range(2), range(2) / range(0), range(2) / range(1)];
        const slope = base.coefficients[1]!;
        const scale = (j: number, coefficient: { estimate: number; standardError: number }) =>
          Math.abs(coefficient.estimate) + coefficient.standardError + 1e-3 * units[j]!;
        expect(close(xScaled.coefficients[1]!.estimate * c, slope.estimate, scale(1, slope))).toBe(true);
        base.coefficients.forEach((coefficient, j) => {
          const scaled = yScaled.coefficients[j]!;
          expect(close(scaled.estimate / c, coefficient.estimate, scale(j, coefficient))).toBe(true);
        });
        expect(close(xScaled.rSquared, base.rSquared, 1)).toBe(true);
      }),
      { numRuns: 100 },
    );
  });
});
