import { Text } from '@radix-ui/themes';
import type { InferenceResult } from '@/features/playground/api/result-payload';
import { formatNumber, pPhrase } from '@/features/playground/model/format-statistic';
import { CoefficientTable } from '@/features/playground/components/results/coefficient-table';

type Covariance = InferenceResult['covariance'];

/** The covariance estimator in words, with the settings the API reports having used. */
export function describeCovariance(covariance: Covariance): string {
  switch (covariance.type) {
    case 'classical':
      return 'Classical: s²(X′X)⁻¹, assuming constant error variance';
    case 'hc0':
    case 'hc1':
    case 'hc2':
    case 'hc3':
      return `Heteroskedasticity-consistent, ${covariance.type.toUpperCase()}`;
    case 'newey-west':
      return `Newey-West (HAC), Bartlett kernel, lag ${covariance.lag ?? '–'}${covariance.lagRule === 'automatic' ? ' chosen automatically' : ''}`;
    case 'cluster':
      return `Cluster-robust over ${covariance.clusterCount ?? '–'} groups (t on ${covariance.inferenceDegreesOfFreedom} df)`;
  }
}

export function InferenceSection({ inference, estimateAccuracy }: { inference: InferenceResult; estimateAccuracy?: (number | null)[] | undefined }) {
  const wald = inference.waldTest;
  return (
    <>
      <Text as="p" size="1" color="gray" className="ll-result-section-note">
        {describeCovariance(inference.covariance)}.
      </Text>
      <CoefficientTable
        rows={inference.coefficients}
        confidenceLevel={inference.confidenceLevel}
        label={`Coefficients under the ${inference.covariance.type} covariance`}
        {...(estimateAccuracy || inference.standardErrorAccuracy
          ? {
              accuracy: {
                ...(estimateAccuracy ? { estimates: estimateAccuracy } : {}),
                ...(inference.standardErrorAccuracy ? { standardErrors: inference.standardErrorAccuracy } : {}),
              },
            }
          : {})}
      />
      {wald ? (
        <Text as="p" size="1" className="ll-result-after-table">
          Joint Wald test that {wald.terms.map((term) => `“${term}”`).join(', ')} {wald.terms.length === 1 ? 'is' : 'are all'} zero: F ={' '}
          <span className="ll-num">{formatNumber(wald.statistic, 5)}</span> on {wald.numeratorDegreesOfFreedom} and{' '}
          {wald.denominatorDegreesOfFreedom} df, <span className="ll-num">{pPhrase(wald.pValue)}</span>.
        </Text>
      ) : null}
    </>
  );
}
