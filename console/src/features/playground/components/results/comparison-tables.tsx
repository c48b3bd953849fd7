import { Badge, Flex, Table, Text } from '@radix-ui/themes';
import type { ComparisonResult } from '@/features/playground/api/result-payload';
import { formatNumber } from '@/features/playground/model/format-statistic';
import { CoefficientTable } from '@/features/playground/components/results/coefficient-table';
import { EffectsTable } from '@/features/playground/components/results/effects-table';
import { NumberCell, NumberHeader, ResultSection } from '@/features/playground/components/results/stat-cells';

export function ComparisonTables({ comparison }: { comparison: ComparisonResult }) {
  const best = comparison.criteria.find((entry) => entry.rank === 1);
  const bestFit = best ? comparison.fits[best.form] : undefined;
  return (
    <>
      <ResultSection title="Forms ranked by AIC on the scale of y" note="Lower AIC and BIC are better; R² and the residual error are on the scale of y so they compare across forms.">
        <Table.Root variant="surface" size="1" className="ll-table ll-stat-table">
          <caption className="ll-visually-hidden">Form comparison</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Form</Table.ColumnHeaderCell>
              <NumberHeader>Rank</NumberHeader>
              <NumberHeader>AIC</NumberHeader>
              <NumberHeader>BIC</NumberHeader>
              <NumberHeader>R² (y scale)</NumberHeader>
              <NumberHeader>Residual SE</NumberHeader>
              <NumberHeader>Log-likelihood</NumberHeader>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {comparison.criteria.map((entry) => (
              <Table.Row key={entry.form}>
                <Table.RowHeaderCell>
                  <Flex gap="2" align="center">
                    <code className="ll-term">{entry.form}</code>
                    {entry.rank === 1 ? (
                      <Badge color="jade" variant="soft">
                        Lowest AIC
                      </Badge>
                    ) : null}
                  </Flex>
                </Table.RowHeaderCell>
                <NumberCell>{entry.rank}</NumberCell>
                <NumberCell>{formatNumber(entry.aic)}</NumberCell>
                <NumberCell>{formatNumber(entry.bic)}</NumberCell>
                <NumberCell>{formatNumber(entry.rSquared, 4)}</NumberCell>
                <NumberCell>{formatNumber(entry.residualStandardError, 5)}</NumberCell>
                <NumberCell>{formatNumber(entry.logLikelihood)}</NumberCell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
        {comparison.skipped.length > 0 ? (
          <ul className="ll-plain-list">
            {comparison.skipped.map((entry) => (
              <li key={entry.form}>
                <Text size="1">
                  <code className="ll-term">{entry.form}</code> not fitted: {entry.message}
                </Text>
              </li>
            ))}
          </ul>
        ) : null}
      </ResultSection>
      {best && bestFit ? (
        <>
          <ResultSection title={`Estimates of the ${best.form} form`} note="On that form's own scale (logs where the form takes them).">
            <CoefficientTable rows={bestFit.coefficients} confidenceLevel={bestFit.confidenceLevel} label={`Coefficients of the ${best.form} form`} />
          </ResultSection>
          <ResultSection title="Effects, in the form's units">
            <EffectsTable fit={bestFit} />
          </ResultSection>
        </>
      ) : null}
    </>
  );
}
