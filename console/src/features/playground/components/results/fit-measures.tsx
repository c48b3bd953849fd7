import { Text } from '@radix-ui/themes';
import type { FitResult } from '@/features/playground/api/result-payload';
import { formatNumber, pPhrase } from '@/features/playground/model/format-statistic';

type Measure = { label: string; value: string; hint: string };

// The fit's summary figures as a row of tiles: each states what it measures, on the model's scale.
export function FitMeasures({ fit }: { fit: FitResult }) {
  const anova = fit.anova;
  const measures: Measure[] = [
    { label: 'Observations', value: String(fit.observationCount), hint: `${fit.coefficientCount} coefficients` },
    {
      label: 'R²',
      value: formatNumber(fit.rSquared, 4),
      hint: fit.rSquaredDefinition === 'centred' ? 'centred total' : 'uncentred total (no intercept)',
    },
    { label: 'Adjusted R²', value: formatNumber(fit.adjustedRSquared, 4), hint: 'penalised for coefficients' },
    {
      label: 'SE of estimate',
      value: formatNumber(fit.residualStandardError, 5),
      hint: `residual std. error, ${fit.residualDegreesOfFreedom} df`,
    },
    {
      label: 'F-statistic',
      value: formatNumber(anova.fStatistic, 5),
      hint: `${pPhrase(anova.fPValue)} on ${anova.regression.degreesOfFreedom} and ${anova.residual.degreesOfFreedom} df`,
    },
    { label: 'AIC', value: formatNumber(fit.informationCriteria.aic, 6), hint: `${fit.informationCriteria.parameterCount} parameters` },
    { label: 'BIC', value: formatNumber(fit.informationCriteria.bic, 6), hint: `log-likelihood ${formatNumber(fit.informationCriteria.logLikelihood, 6)}` },
  ];
  return (
    <dl className="ll-measures" aria-label="Fit measures">
      {measures.map((measure) => (
        <div key={measure.label} className="ll-measure">
          <Text as="div" size="1" color="gray">
            <dt>{measure.label}</dt>
          </Text>
          <dd className="ll-measure-value ll-num">{measure.value}</dd>
          <Text as="div" size="1" color="gray" className="ll-measure-hint">
            {measure.hint}
          </Text>
        </div>
      ))}
    </dl>
  );
}
