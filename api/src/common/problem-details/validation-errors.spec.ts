import { ValidationError } from 'class-validator';
import { toFieldProblems } from './validation-errors';

function error(property: string, constraints?: Record<string, string>, children: ValidationError[] = []) {
  const result = new ValidationError();
  result.property = property;
  result.constraints = constraints;
  result.children = children;
  return result;
}

describe('toFieldProblems', () => {
  it('turns nested property paths into JSON Pointers', () => {
    const problems = toFieldProblems([
      error('model', undefined, [error('predictors', undefined, [error('1', { isString: 'must be a string' })])]),
    ]);
    expect(problems).toEqual([{ pointer: '#/model/predictors/1', detail: 'must be a string' }]);
  });

  it('escapes "/" and "~" in property names as RFC 6901 requires', () => {
    const problems = toFieldProblems([error('a/b~c', { isDefined: 'required' })]);
    expect(problems[0]?.pointer).toBe('#/a~1b~0c');
  });
});
