import type { ResultPayload } from '@/features/playground/api/result-payload';
import { AnovaTable } from '@/features/playground/components/results/anova-table';
import { BatchTables } from '@/features/playground/components/results/batch-tables';
import { CoefficientTable } from '@/features/playground/components/results/coefficient-table';
import { ComparisonTables } from '@/features/playground/components/results/comparison-tables';
import { DiagnosticsTable } from '@/features/playground/components/results/diagnostics-table';
import { EffectsTable } from '@/features/playground/components/results/effects-table';
import { FitMeasures } from '@/features/playground/components/results/fit-measures';
import { InferenceSection } from '@/features/playground/components/results/inference-section';
import { PredictionTable } from '@/features/playground/components/results/prediction-table';
import { ResultSection } from '@/features/playground/components/results/stat-cells';
import { RollingTable } from '@/features/playground/components/results/rolling-table';

// The tables for whichever sections the answer holds, in reading order.
export function ResultTables({ payload }: { payload: ResultPayload }) {
  const { fit, inference, diagnostics } = payload;
  return (
    <div className="ll-result-tables">
      {fit ? (
        <>
          <FitMeasures fit={fit} />
          <ResultSection
            title="Estimates"
            note={
              `Classical standard errors; ${fit.response} on ${fit.predictors.join(', ')}, form ${fit.form}${fit.weights ? `, weighted by ${fit.weights}` : ''}.` +
              (fit.numerics.accuracy ? ' Error bound: the most each estimate / standard error can differ, relatively, from the exact least-squares value for the numbers sent.' : '')
            }
          >
            <CoefficientTable
              rows={fit.coefficients}
              confidenceLevel={fit.confidenceLevel}
              label="Coefficients"
              {...(fit.numerics.accuracy
                ? { accuracy: { estimates: fit.numerics.accuracy.coefficients, standardErrors: fit.numerics.accuracy.standardErrors } }
                : {})}
            />
          </ResultSection>
          {inference && inference.covariance.type !== 'classical' ? (
            <ResultSection title={`Inference with the ${inference.covariance.type} covariance`}>
              <InferenceSection inference={inference} estimateAccuracy={fit.numerics.accuracy?.coefficients} />
            </ResultSection>
          ) : null}
          <ResultSection title="Analysis of variance">
            <AnovaTable anova={fit.anova} />
          </ResultSection>
          <ResultSection title="Effects, in the form's units">
            <EffectsTable fit={fit} />
          </ResultSection>
          {inference && inference.covariance.type === 'classical' && inference.waldTest ? (
            <ResultSection title="Joint test">
              <InferenceSection inference={inference} estimateAccuracy={fit.numerics.accuracy?.coefficients} />
            </ResultSection>
          ) : null}
          {diagnostics ? (
            <ResultSection title="Assumption checks" note="A flag means the check's p-value fell below the chosen level; it is a prompt to look, not a verdict.">
              <DiagnosticsTable diagnostics={diagnostics} significanceLevel={inference?.significanceLevel ?? 0.05} />
            </ResultSection>
          ) : null}
        </>
      ) : null}
      {payload.comparison ? <ComparisonTables comparison={payload.comparison} /> : null}
      {payload.prediction ? <PredictionTable prediction={payload.prediction} /> : null}
      {payload.batch ? <BatchTables batch={payload.batch} /> : null}
      {payload.rolling ? <RollingTable rolling={payload.rolling} /> : null}
    </div>
  );
}
