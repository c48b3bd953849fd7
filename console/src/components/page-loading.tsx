import { Flex, Spinner, Text } from '@radix-ui/themes';

export function PageLoading() {
  return (
    <Flex className="ll-page-loading" align="center" justify="center" gap="2" role="status">
      <Spinner size="2" />
      <Text size="2" color="gray">
        Loading…
      </Text>
    </Flex>
  );
}
