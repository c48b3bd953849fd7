import { fisherFSurvival } from '../distributions';
import { resetTest } from './reset-test';
import { seededSource } from './seeded-series';
import { fittedModel, ones, normalEquationsFit } from './test-support';

// Invented scenario: card-processing fee (response) against ticket size, synthetic seeded data.
function ticketData(seed: number, n: number, curvature: number) {
  const source = seededSource(seed);
  const ticket: number[] = [];
  const fee: number[] = [];
  for (let i = 0; i < n; i++) {
    const size = 1 + 9 * source.uniform();
    ticket.push(size);
    fee.push(0.3 + 0.5 * size + curvature * size * size + 0.4 * source.normal());
  }
  return { ticket, fee };
}

describe('RESET test (Ramsey 1969), F form with fitted powers 2..3', () => {
  it('matches the F statistic recomputed from two direct normal-equation fits', () => {
    const { ticket, fee } = ticketData(11, 60, 0.02);
    const model = fittedModel({ ticket }, fee);
    const result = resetTest(model, 0.05);
    const restricted = normalEquationsFit([ones(60), ticket], fee);
    const fitted = fee.map((value, i) => value - restricted.residuals[i]!);
    const augmented = normalEquationsFit(
      [ones(60), ticket, fitted.map((v) => v ** 2), fitted.map((v) => v ** 3)],
      fee,
    );
    const expected = ((restricted.rss - augmented.rss) / 2) / (augmented.rss / (60 - 2 - 2));
    // Normal equations lose a few digits on the cubic column; 1e-6 relative.
    expect(result.statistic).toBeCloseTo(expected, 6);
    expect(result.degreesOfFreedom).toBe(2);
    expect(result.denominatorDegreesOfFreedom).toBe(56);
    expect(result.powers).toEqual([2, 3]);
    expect(result.pValue).toBeCloseTo(fisherFSurvival(expected, 2, 56), 8);
  });

  it('uses the F distribution: the published 5% point F(2, 60) = 3.15 gives p close to 0.05', () => {
    // Upper 5% point of F(2, 60): 3.15 in standard F tables (e.g. NIST/SEMATECH e-Handbook, table 1.3.6.7.2).
    expect(fisherFSurvival(3.15, 2, 60)).toBeCloseTo(0.05, 2);
  });

  it('separates curved from straight data over 200 seeded runs (power >= 0.9, size within 0.02..0.09)', () => {
    let curvedFlags = 0;
    let straightFlags = 0;
    for (let run = 0; run < 200; run++) {
      const curved = ticketData(1000 + run, 80, 0.08);
      const straight = ticketData(5000 + run, 80, 0);
      if (resetTest(fittedModel({ ticket: curved.ticket }, curved.fee), 0.05).flagged) curvedFlags++;
      if (resetTest(fittedModel({ ticket: straight.ticket }, straight.fee), 0.05).flagged) straightFlags++;
    }
    expect(curvedFlags / 200).toBeGreaterThanOrEqual(0.9);
    // Nominal size 0.05; a binomial(200, 0.05) count falls in 4..18 with probability above 0.99.
    expect(straightFlags).toBeGreaterThanOrEqual(4);
    expect(straightFlags).toBeLessThanOrEqual(18);
  });

  it('rejects a highest power below 2, naming the option', () => {
    const { ticket, fee } = ticketData(3, 30, 0);
    expect(() => resetTest(fittedModel({ ticket }, fee), 0.05, 1)).toThrow(
      expect.objectContaining({ reason: 'test-not-defined', field: 'diagnosticOptions.resetMaxPower' }),
    );
  });
});
