import { ReloadIcon } from '@radix-ui/react-icons';
import { Button, Flex } from '@radix-ui/themes';
import { useRouteError } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { useDocumentTitle } from '@/components/use-document-title';

// A page chunk that fails to download (a new deployment, a dropped connection) lands here
// rather than leaving a blank screen.
export function RouteError() {
  const error = useRouteError();
  useDocumentTitle('Something went wrong');
  if (import.meta.env.DEV) console.error(error);

  return (
    <Flex className="ll-route-error" direction="column" align="center" justify="center">
      <EmptyState
        headingLevel="h1"
        title="This page could not be shown"
        description="The console may have been updated while it was open, or the connection dropped. Reloading usually helps."
      >
        <Button onClick={() => window.location.reload()}>
          <ReloadIcon aria-hidden="true" /> Reload the console
        </Button>
      </EmptyState>
    </Flex>
  );
}
