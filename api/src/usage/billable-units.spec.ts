import { billableUnits, rollingModels } from './billable-units';

describe('billableUnits (the documented rule: models + ceil(observations / 10 000), at least 1)', () => {
  it.each([
    [{ models: 1, observations: 36 }, 2],
    [{ models: 1, observations: 10_000 }, 2],
    [{ models: 1, observations: 10_001 }, 3],
    [{ models: 4, observations: 40_000 }, 8],
    [{ models: 5000, observations: 5_000_000 }, 5500],
    [{ models: 0, observations: 3 }, 1],
    [{ models: 0, observations: 0 }, 1],
  ])('%j costs %d units', (work, units) => {
    expect(billableUnits(work)).toBe(units);
  });

  it('counts rolling windows in blocks of 100', () => {
    expect(rollingModels(1)).toBe(1);
    expect(rollingModels(100)).toBe(1);
    expect(rollingModels(101)).toBe(2);
  });

  it('refuses negative work', () => {
    expect(() => billableUnits({ models: -1, observations: 0 })).toThrow();
  });
});
