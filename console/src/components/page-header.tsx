import { Flex, Heading, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { useDocumentTitle } from '@/components/use-document-title';

type PageHeaderProps = {
  title: string;
  description: string;
  badge?: ReactNode;
  actions?: ReactNode;
};

export function PageHeader({ title, description, badge, actions }: PageHeaderProps) {
  useDocumentTitle(title);
  return (
    <Flex className="ll-page-header" justify="between" align="end" gap="4" wrap="wrap">
      <Flex direction="column" gap="1">
        <Flex align="center" gap="3">
          <Heading as="h1" size="7" weight="medium">
            {title}
          </Heading>
          {badge}
        </Flex>
        <Text as="p" size="3" color="gray">
          {description}
        </Text>
      </Flex>
      {actions ? <Flex gap="2">{actions}</Flex> : null}
    </Flex>
  );
}
