import { Theme } from '@radix-ui/themes';
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { CoefficientTable } from '@/features/playground/components/results/coefficient-table';

// Invented numbers in the shape the API sends.
const rows = [
  { term: '(intercept)', estimate: 1.25, standardError: 0.5, tStatistic: 2.5, pValue: 0.02, confidenceInterval: { lower: 0.2, upper: 2.3 } },
  { term: 'ticket_size', estimate: 0.031, standardError: 0.004, tStatistic: 7.75, pValue: 0.00001, confidenceInterval: { lower: 0.022, upper: 0.04 } },
];

afterEach(() => cleanup());

describe('coefficient table', () => {
  it('shows the stated error bounds beside each row, and a dash where none is stated', () => {
    render(
      <Theme>
        <CoefficientTable rows={rows} confidenceLevel={0.95} label="Coefficients" accuracy={{ estimates: [2.2e-16, null], standardErrors: [4.4e-16, 4.4e-16] }} />
      </Theme>,
    );
    expect(screen.getByRole('columnheader', { name: 'Error bound' })).toBeTruthy();
    expect(document.querySelector('[data-accuracy="(intercept)"]')?.textContent).toBe('≤ 2.2e-16 / ≤ 4.4e-16');
    expect(document.querySelector('[data-accuracy="ticket_size"]')?.textContent).toBe('– / ≤ 4.4e-16');
  });

  it('has no error-bound column when the answer states none', () => {
    render(
      <Theme>
        <CoefficientTable rows={rows} confidenceLevel={0.95} label="Coefficients" />
      </Theme>,
    );
    expect(screen.queryByRole('columnheader', { name: 'Error bound' })).toBeNull();
  });
});
