/**
 * Anscombe's quartet: F. J. Anscombe (1973), "Graphs in Statistical Analysis", The American
 * Statistician 27(1), 17-21, Table 1 (data as printed in the paper; typed from it, value from memory).
 * The paper reports for all four sets the same fitted line y = 3.00 + 0.500 x, standard error of the
 * slope 0.118, residual degrees of freedom 9 and R² 0.67 (correlation 0.82). Checked to half a unit in
 * the printed last digit.
 */
import { fitModel } from './fit-model';

const x123 = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
const quartet: Record<string, { x: number[]; y: number[] }> = {
  I: { x: x123, y: [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68] },
  II: { x: x123, y: [9.14, 8.14, 8.74, 8.77, 9.26, 8.1, 6.13, 3.1, 9.13, 7.26, 4.74] },
  III: { x: x123, y: [7.46, 6.77, 12.74, 7.11, 7.81, 8.84, 6.08, 5.39, 8.15, 6.42, 5.73] },
  IV: { x: [8, 8, 8, 8, 8, 8, 8, 19, 8, 8, 8], y: [6.58, 5.76, 7.71, 8.84, 8.47, 7.04, 5.25, 12.5, 5.56, 7.91, 6.89] },
};

describe("Anscombe's quartet (Anscombe, 1973, The American Statistician)", () => {
  it.each(Object.keys(quartet))('set %s gives the published line y = 3.00 + 0.500x and R² = 0.67', (set) => {
    const data = quartet[set]!;
    const result = fitModel({ columns: { x: data.x, y: data.y }, response: 'y', predictors: ['x'] });
    const [intercept, slope] = result.coefficients;
    expect(Math.abs(intercept!.estimate - 3.0)).toBeLessThan(0.005);
    expect(Math.abs(slope!.estimate - 0.5)).toBeLessThan(0.0005);
    expect(Math.abs(slope!.standardError - 0.118)).toBeLessThan(0.0005);
    expect(Math.abs(result.rSquared - 0.67)).toBeLessThan(0.005);
    expect(Math.abs(Math.sqrt(result.rSquared) - 0.82)).toBeLessThan(0.005);
    expect(result.anova.residual.degreesOfFreedom).toBe(9);
  });
});
