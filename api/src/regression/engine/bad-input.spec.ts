/** Every rejected input raises a typed EngineError with a stable code and the offending field. */
import { compareForms } from './compare-forms';
import { EngineError } from './errors';
import { fitModel } from './fit-model';
import { FitInput } from './fit-input';

function rejection(input: unknown): EngineError {
  try {
    fitModel(input as FitInput);
  } catch (error) {
    expect(error).toBeInstanceOf(EngineError);
    return error as EngineError;
  }
  throw new Error('expected the engine to reject the input');
}

const good = { x: [1, 2, 3, 4, 5], y: [2.1, 3.9, 6.2, 7.8, 10.1] };

describe('bad input', () => {
  it('empty columns', () => {
    const error = rejection({ columns: { x: [], y: [] }, response: 'y', predictors: ['x'] });
    expect(error.code).toBe('empty-input');
    expect(error.column).toBe('y');
  });

  it('unequal lengths name the column', () => {
    const error = rejection({ columns: { x: [1, 2, 3], y: [1, 2] }, response: 'y', predictors: ['x'] });
    expect(error.code).toBe('length-mismatch');
    expect(error.column).toBe('x');
  });

  it.each([
    ['NaN', Number.NaN],
    ['Infinity', Infinity],
    ['null', null],
  ])('%s names the column and the 0-based row', (_label, value) => {
    for (const columns of [
      { x: [1, 2, value, 4, 5], y: good.y },
      { x: Float64Array.from([1, 2, value ?? Number.NaN, 4, 5]), y: Float64Array.from(good.y) },
    ]) {
      const error = rejection({ columns, response: 'y', predictors: ['x'] });
      expect(error.code).toBe('non-finite-value');
      expect(error.column).toBe('x');
      expect(error.row).toBe(2);
    }
  });

  it('non-finite values are caught on the multi-predictor path too', () => {
    const error = rejection({
      columns: { a: Float64Array.of(1, 2, 3, 4, 5), b: Float64Array.of(3, 1, 4, 1, 5), y: Float64Array.of(1, 2, 3, Number.NaN, 5) },
      response: 'y',
      predictors: ['a', 'b'],
    });
    expect(error.code).toBe('non-finite-value');
    expect(error.column).toBe('y');
    expect(error.row).toBe(3);
  });

  it('n <= number of parameters', () => {
    expect(rejection({ columns: { x: [1, 2], y: [1, 3] }, response: 'y', predictors: ['x'] }).code).toBe('too-few-observations');
    expect(
      rejection({ columns: { a: [1, 2, 3], b: [2, 1, 5], y: [1, 3, 2] }, response: 'y', predictors: ['a', 'b'] }).code,
    ).toBe('too-few-observations');
  });

  it('zero variance in a predictor or in the response', () => {
    const constant = rejection({ columns: { x: [3, 3, 3, 3], y: [1, 2, 3, 4] }, response: 'y', predictors: ['x'] });
    expect(constant.code).toBe('constant-column');
    expect(constant.column).toBe('x');
    const flat = rejection({ columns: { x: [1, 2, 3, 4], y: [5, 5, 5, 5] }, response: 'y', predictors: ['x'] });
    expect(flat.code).toBe('constant-response');
    expect(flat.column).toBe('y');
    const flatMulti = rejection({ columns: { a: [1, 2, 3, 4, 6], b: [1, 0, 1, 0, 1], y: [5, 5, 5, 5, 5] }, response: 'y', predictors: ['a', 'b'] });
    expect(flatMulti.code).toBe('constant-response');
  });

  it.each([0, 1, -0.5, 1.5, Number.NaN, '0.95'])('confidence level %p is rejected', (level) => {
    const error = rejection({ columns: good, response: 'y', predictors: ['x'], confidenceLevel: level });
    expect(error.code).toBe('invalid-confidence-level');
    expect(error.field).toBe('confidenceLevel');
  });

  it('unknown form names', () => {
    const error = rejection({ columns: good, response: 'y', predictors: ['x'], form: 'log-square' });
    expect(error.code).toBe('unknown-form');
    expect(error.field).toBe('form');
    expect(() => compareForms({ columns: good, response: 'y', predictors: ['x'], forms: ['lin-lin', 'cubic' as never] })).toThrow(
      expect.objectContaining({ code: 'unknown-form' }),
    );
  });

  it('missing, duplicated or self-referencing columns', () => {
    expect(rejection({ columns: good, response: 'y', predictors: ['volume'] })).toMatchObject({ code: 'missing-column', column: 'volume' });
    expect(rejection({ columns: good, response: 'y', predictors: ['x', 'x'] })).toMatchObject({ code: 'duplicate-column', column: 'x' });
    expect(rejection({ columns: good, response: 'y', predictors: ['y'] })).toMatchObject({ code: 'duplicate-column', column: 'y' });
    expect(rejection({ columns: good, response: 'y', predictors: [] })).toMatchObject({ code: 'invalid-argument', field: 'predictors' });
  });

  it('logs of non-positive values name the column and the first offending row', () => {
    const error = rejection({ columns: { x: [1, 2, 0, -1, 5], y: good.y }, response: 'y', predictors: ['x'], form: 'lin-log' });
    expect(error).toMatchObject({ code: 'non-positive-log-argument', column: 'x', row: 2 });
    const response = rejection({ columns: { x: good.x, y: [1, -2, 3, 4, 5] }, response: 'y', predictors: ['x'], form: 'log-lin' });
    expect(response).toMatchObject({ code: 'non-positive-log-argument', column: 'y', row: 1 });
  });

  it('non-positive weights name the weight column and row', () => {
    const error = rejection({ columns: { ...good, w: [1, 1, 0, 1, 1] }, response: 'y', predictors: ['x'], weights: 'w' });
    expect(error).toMatchObject({ code: 'non-positive-weight', column: 'w', row: 2 });
  });

  it('collinear predictors name both columns', () => {
    const error = rejection({
      columns: { feeCount: [1, 2, 3, 4, 5, 7], feeTotal: [2.5, 5, 7.5, 10, 12.5, 17.5], y: [3, 1, 4, 1, 5, 9] },
      response: 'y',
      predictors: ['feeCount', 'feeTotal'],
    });
    expect(error).toMatchObject({ code: 'collinear-columns', column: 'feeTotal', columns: ['feeCount', 'feeTotal'] });
  });

  it('errors serialise to plain objects with their details', () => {
    const error = rejection({ columns: { x: [1, 2, 0, 4], y: [1, 2, 3, 4] }, response: 'y', predictors: ['x'], form: 'log-log' });
    expect(JSON.parse(JSON.stringify(error))).toEqual({ code: 'non-positive-log-argument', message: error.message, column: 'x', row: 2 });
  });

  it('never returns NaN for a perfect fit: undefined statistics are null', () => {
    const result = fitModel({ columns: { x: [1, 2, 3, 4], y: [3, 5, 7, 9] }, response: 'y', predictors: ['x'] });
    expect(result.perfectFit).toBe(true);
    expect(result.coefficients[1]!.tStatistic).toBeNull();
    expect(result.anova.fStatistic).toBeNull();
    expect(result.informationCriteria.aic).toBeNull();
    expect(JSON.stringify(result)).not.toMatch(/NaN|Infinity/);
  });
});
