import { Table, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

// Small building blocks shared by the result tables: right-aligned figures in the code face, and a
// section heading with an optional one-line note.

export function NumberCell({ children }: { children: ReactNode }) {
  return (
    <Table.Cell justify="end" className="ll-num ll-nowrap">
      {children}
    </Table.Cell>
  );
}

export function NumberHeader({ children, title }: { children: ReactNode; title?: string }) {
  return (
    <Table.ColumnHeaderCell justify="end" title={title}>
      {children}
    </Table.ColumnHeaderCell>
  );
}

export function TermCell({ children }: { children: ReactNode }) {
  return (
    <Table.RowHeaderCell>
      <code className="ll-term">{children}</code>
    </Table.RowHeaderCell>
  );
}

export function ResultSection({ title, note, children }: { title: string; note?: ReactNode; children: ReactNode }) {
  return (
    <section className="ll-result-section" aria-label={title}>
      <Text as="p" size="2" weight="medium" className="ll-result-section-title">
        {title}
      </Text>
      {note ? (
        <Text as="p" size="1" color="gray" className="ll-result-section-note">
          {note}
        </Text>
      ) : null}
      {children}
    </section>
  );
}
