import { ProblemException } from '../common/problem-details/problem.exception';
import { prepareModelData } from './model-data';

const need = (name: string, kind: 'numeric' | 'label' = 'numeric') => ({ name, pointer: '#/model/response', kind });

function problemOf(action: () => unknown): ProblemException {
  try {
    action();
  } catch (error) {
    if (error instanceof ProblemException) return error;
    throw error;
  }
  throw new Error('expected a problem');
}

describe('prepareModelData', () => {
  const columns = { y: [1, 2, null, 4, 5], x: [10, Number.NaN, 30, 40, 50], desk: ['a', 'b', 'c', '', 'e'] };

  it('drops rows listwise across the used columns only', () => {
    const prepared = prepareModelData(columns, [need('y'), need('x')], 'drop-rows', '#/data/columns');
    expect(Array.from(prepared.numeric.y!)).toEqual([1, 4, 5]);
    expect(Array.from(prepared.numeric.x!)).toEqual([10, 40, 50]);
    expect(prepared.rowsDropped).toEqual([1, 2]);
  });

  it('rejects with the 0-based rows when asked to', () => {
    const problem = problemOf(() => prepareModelData(columns, [need('y'), need('x')], 'reject', '#/data/columns'));
    expect(problem.extensions).toMatchObject({ code: 'missing-values', rows: [1, 2] });
  });

  it('treats an empty label as missing and keeps labels aligned', () => {
    const prepared = prepareModelData(columns, [need('y'), need('desk', 'label')], 'drop-rows', '#/data/columns');
    expect(prepared.labels.desk).toEqual(['a', 'b', 'e']);
  });

  it('names a text cell in a numeric column', () => {
    const problem = problemOf(() => prepareModelData({ y: [1, 'two', 3] }, [need('y')], 'drop-rows', '#/data/columns'));
    expect(problem.detail).toContain('row 1 (0-based) holds "two"');
  });

  it('names an unknown column and unequal lengths', () => {
    expect(problemOf(() => prepareModelData({ y: [1] }, [need('z')], 'reject', '#')).extensions).toMatchObject({ code: 'unknown-column' });
    expect(problemOf(() => prepareModelData({ y: [1, 2], x: [1] }, [need('y'), need('x')], 'reject', '#')).extensions).toMatchObject({
      code: 'unequal-lengths',
    });
  });
});
