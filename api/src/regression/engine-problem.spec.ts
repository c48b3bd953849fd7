import { AnalysisError } from './engine/diagnostics/analysis-error';
import { EngineError } from './engine/errors';
import { engineProblem, requestPointer } from './engine-problem';

describe('engine failures as problem details', () => {
  it('points model fields into #/model and options at the top level', () => {
    expect(requestPointer('predictors')).toBe('#/model/predictors');
    expect(requestPointer('covariance.lag')).toBe('#/covariance/lag');
    expect(requestPointer('covariance.groups')).toBe('#/covariance/groupColumn');
    expect(requestPointer('diagnostics/2')).toBe('#/diagnostics/2');
  });

  it('names the column and 0-based row of a log of a non-positive value', () => {
    const problem = engineProblem(
      new EngineError('non-positive-log-argument', 'Column "ticket_size" has 0 at row 3 (0-based).', { column: 'ticket_size', row: 3 }),
    );
    expect(problem.getStatus()).toBe(422);
    expect(problem.extensions).toMatchObject({ code: 'non-positive-log-argument', column: 'ticket_size', row: 3 });
    expect(problem.fieldErrors[0]?.pointer).toBe('#/data/columns/ticket_size/3');
  });

  it('uses the analysis reason as the code', () => {
    const problem = engineProblem(new AnalysisError('lag-too-large', 'Lag 500 is too large.', { field: 'covariance.lag' }));
    expect(problem.extensions).toMatchObject({ code: 'lag-too-large' });
    expect(problem.fieldErrors[0]?.pointer).toBe('#/covariance/lag');
  });
});
