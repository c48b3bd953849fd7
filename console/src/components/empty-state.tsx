import { Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';

type EmptyStateProps = {
  title: string;
  description: ReactNode;
  icon?: ReactNode;
  children?: ReactNode;
  headingLevel?: 'h1' | 'h2' | 'h3';
};

// Hollow points over a dashed guide: the "nothing fitted yet" picture used on empty pages.
function EmptyPlot() {
  return (
    <svg viewBox="0 0 120 56" width="120" height="56" aria-hidden="true" focusable="false" className="ll-empty-plot">
      <path d="M6 48H114" style={{ stroke: 'var(--gray-6)' }} strokeWidth="1" />
      <path
        d="M10 44L110 12"
        style={{ stroke: 'var(--accent-8)' }}
        strokeWidth="1.5"
        strokeDasharray="4 5"
        strokeLinecap="round"
      />
      <g fill="none" style={{ stroke: 'var(--gray-8)' }} strokeWidth="1.5">
        <circle cx="26" cy="43" r="3.5" />
        <circle cx="48" cy="29" r="3.5" />
        <circle cx="70" cy="30" r="3.5" />
        <circle cx="94" cy="14" r="3.5" />
      </g>
    </svg>
  );
}

export function EmptyState({ title, description, icon, children, headingLevel = 'h2' }: EmptyStateProps) {
  return (
    <Flex className="ll-empty-state" direction="column" align="center" gap="3">
      {icon ?? <EmptyPlot />}
      <Heading as={headingLevel} size="4" weight="medium" align="center">
        {title}
      </Heading>
      <Text as="p" size="2" color="gray" align="center" className="ll-empty-state-text">
        {description}
      </Text>
      {children ? (
        <Flex gap="3" mt="2" wrap="wrap" justify="center">
          {children}
        </Flex>
      ) : null}
    </Flex>
  );
}
