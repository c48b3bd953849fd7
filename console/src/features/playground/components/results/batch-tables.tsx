import { Badge, Callout, Flex, Table, Text } from '@radix-ui/themes';
import type { BatchResult } from '@/features/playground/api/result-payload';
import { formatNumber, formatPValue } from '@/features/playground/model/format-statistic';
import { CoefficientTable } from '@/features/playground/components/results/coefficient-table';
import { NumberCell, NumberHeader, ResultSection } from '@/features/playground/components/results/stat-cells';

export function BatchTables({ batch }: { batch: BatchResult }) {
  return (
    <>
      <ResultSection
        title={`${batch.fits.length} responses on one design`}
        note={`${batch.observationCount} rows, ${batch.coefficientCount} coefficients each, form ${batch.form}; classical standard errors.`}
      >
        <Table.Root variant="surface" size="1" className="ll-table ll-stat-table">
          <caption className="ll-visually-hidden">Batch summary</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Response</Table.ColumnHeaderCell>
              <NumberHeader>R²</NumberHeader>
              <NumberHeader>Adjusted R²</NumberHeader>
              <NumberHeader>SE of estimate</NumberHeader>
              <NumberHeader>F p-value</NumberHeader>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {batch.fits.map((entry) =>
              entry.status === 'fitted' ? (
                <Table.Row key={entry.response}>
                  <Table.RowHeaderCell>
                    <code className="ll-term">{entry.response}</code>
                  </Table.RowHeaderCell>
                  <NumberCell>{formatNumber(entry.rSquared, 4)}</NumberCell>
                  <NumberCell>{formatNumber(entry.adjustedRSquared, 4)}</NumberCell>
                  <NumberCell>{formatNumber(entry.residualStandardError, 5)}</NumberCell>
                  <NumberCell>{formatPValue(entry.fTest?.pValue)}</NumberCell>
                </Table.Row>
              ) : (
                <Table.Row key={entry.response}>
                  <Table.RowHeaderCell>
                    <code className="ll-term">{entry.response}</code>
                  </Table.RowHeaderCell>
                  <Table.Cell colSpan={4}>
                    <Flex gap="2" align="center">
                      <Badge color="red" variant="soft">
                        Not fitted
                      </Badge>
                      <Text size="1">{entry.message}</Text>
                    </Flex>
                  </Table.Cell>
                </Table.Row>
              ),
            )}
          </Table.Body>
        </Table.Root>
      </ResultSection>
      {batch.fits.map((entry) =>
        entry.status === 'fitted' ? (
          <ResultSection key={entry.response} title={`Estimates for ${entry.response}`}>
            <CoefficientTable rows={entry.coefficients} confidenceLevel={batch.confidenceLevel} label={`Coefficients for ${entry.response}`} />
          </ResultSection>
        ) : null,
      )}
      {batch.fits.some((entry) => entry.status === 'failed') ? (
        <Callout.Root color="amber" size="1" variant="surface">
          <Callout.Text>Responses that could not be fitted are listed with the reason; the others are unaffected.</Callout.Text>
        </Callout.Root>
      ) : null}
    </>
  );
}
