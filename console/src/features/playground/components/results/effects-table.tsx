import { Table, Text } from '@radix-ui/themes';
import type { FitResult } from '@/features/playground/api/result-payload';
import { formatInterval, formatNumber } from '@/features/playground/model/format-statistic';
import { NumberCell, NumberHeader, TermCell } from '@/features/playground/components/results/stat-cells';

type Effect = FitResult['effects'][number];

/** The unit of an effect in words, naming the response and the predictor. */
export function effectUnit(unit: Effect['unit'], response: string, term: string): string {
  switch (unit) {
    case 'response-units-per-predictor-unit':
      return `${response} per unit of ${term}`;
    case 'percent-per-predictor-unit':
      return `% change in ${response} per unit of ${term}`;
    case 'response-units-per-percent':
      return `change in ${response} per 1% rise in ${term}`;
    case 'percent-per-percent':
      return `% change in ${response} per 1% rise in ${term}`;
  }
}

export function EffectsTable({ fit }: { fit: FitResult }) {
  if (fit.effects.length === 0) return null;
  return (
    <Table.Root variant="surface" size="1" className="ll-table ll-stat-table">
      <caption className="ll-visually-hidden">Effects in the form's units</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Predictor</Table.ColumnHeaderCell>
          <NumberHeader>Effect</NumberHeader>
          <NumberHeader title="The usual linear approximation">Approx.</NumberHeader>
          <NumberHeader>Interval</NumberHeader>
          <Table.ColumnHeaderCell>Read as</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {fit.effects.map((effect) => (
          <Table.Row key={effect.term}>
            <TermCell>{effect.term}</TermCell>
            <NumberCell>{formatNumber(effect.value)}</NumberCell>
            <NumberCell>{formatNumber(effect.approximation)}</NumberCell>
            <NumberCell>{formatInterval(effect.confidenceInterval)}</NumberCell>
            <Table.Cell>
              <Text as="div" size="1">
                {effectUnit(effect.unit, fit.response, effect.term)}
              </Text>
              <Text as="div" size="1" color="gray">
                {effect.description}
              </Text>
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
