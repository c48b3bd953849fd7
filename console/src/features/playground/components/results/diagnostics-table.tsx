import { Badge, Table, Text } from '@radix-ui/themes';
import type { Diagnostics } from '@/features/playground/api/result-payload';
import { formatNumber, formatPValue } from '@/features/playground/model/format-statistic';
import { NumberCell, NumberHeader } from '@/features/playground/components/results/stat-cells';

type CheckKey = keyof Diagnostics;

const checks: Array<{ key: CheckKey; question: string; test: string }> = [
  { key: 'reset', question: 'Is the functional form adequate?', test: 'RESET' },
  { key: 'breuschPagan', question: 'Is the error variance constant?', test: 'Breusch-Pagan' },
  { key: 'white', question: 'Is the error variance constant?', test: 'White' },
  { key: 'durbinWatson', question: 'Are neighbouring errors uncorrelated?', test: 'Durbin-Watson' },
  { key: 'breuschGodfrey', question: 'Are lagged errors uncorrelated?', test: 'Breusch-Godfrey' },
  { key: 'jarqueBera', question: 'Are the errors roughly normal?', test: 'Jarque-Bera' },
  { key: 'collinearity', question: 'Are the predictors distinct enough?', test: 'VIF and condition number' },
];

function CheckBadge({ flagged }: { flagged: boolean }) {
  return flagged ? (
    <Badge color="amber" variant="soft">
      Flag
    </Badge>
  ) : (
    <Badge color="jade" variant="soft">
      Pass
    </Badge>
  );
}

export function DiagnosticsTable({ diagnostics, significanceLevel }: { diagnostics: Diagnostics; significanceLevel: number }) {
  const present = checks.filter((check) => diagnostics[check.key] !== undefined);
  if (present.length === 0) {
    return (
      <Text as="p" size="2" color="gray">
        No assumption checks were asked for.
      </Text>
    );
  }
  return (
    <Table.Root variant="surface" size="1" className="ll-table ll-stat-table">
      <caption className="ll-visually-hidden">Assumption checks</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Check</Table.ColumnHeaderCell>
          <NumberHeader>Statistic</NumberHeader>
          <NumberHeader>p-value</NumberHeader>
          <Table.ColumnHeaderCell>At {significanceLevel}</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {present.map(({ key, question, test }) => {
          const result = diagnostics[key];
          if (result === undefined) return null;
          const heading = (
            <Table.RowHeaderCell>
              <Text as="div" size="2">
                {question}
              </Text>
              <Text as="div" size="1" color="gray">
                {test}
              </Text>
            </Table.RowHeaderCell>
          );
          if (result.status === 'not-defined') {
            return (
              <Table.Row key={key} data-check={key} data-outcome="not-defined">
                {heading}
                <Table.Cell colSpan={2}>
                  <Text size="1" color="gray">
                    {result.message}
                  </Text>
                </Table.Cell>
                <Table.Cell>
                  <Badge color="gray" variant="outline">
                    Not defined
                  </Badge>
                </Table.Cell>
              </Table.Row>
            );
          }
          if ('varianceInflation' in result) {
            const largest = Math.max(...result.varianceInflation.map((entry) => entry.varianceInflationFactor), 0);
            return (
              <Table.Row key={key} data-check={key} data-outcome={result.flagged ? 'flag' : 'pass'}>
                {heading}
                <NumberCell>
                  {result.varianceInflation.length > 0 ? `largest VIF ${formatNumber(largest, 4)}` : 'no VIF (one predictor)'}
                </NumberCell>
                <NumberCell>κ {formatNumber(result.conditionNumber, 4)}</NumberCell>
                <Table.Cell>
                  <CheckBadge flagged={result.flagged} />
                </Table.Cell>
              </Table.Row>
            );
          }
          return (
            <Table.Row key={key} data-check={key} data-outcome={result.flagged ? 'flag' : 'pass'}>
              {heading}
              <NumberCell>{formatNumber(result.statistic, 5)}</NumberCell>
              <NumberCell>{formatPValue(result.pValue)}</NumberCell>
              <Table.Cell>
                <CheckBadge flagged={result.flagged} />
              </Table.Cell>
            </Table.Row>
          );
        })}
      </Table.Body>
    </Table.Root>
  );
}
