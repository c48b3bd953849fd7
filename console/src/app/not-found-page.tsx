import { Button } from '@radix-ui/themes';
import { Link as RouterLink } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { useDocumentTitle } from '@/components/use-document-title';
import { paths } from '@/config/paths';

export function NotFoundPage() {
  useDocumentTitle('Page not found');
  return (
    <div className="ll-not-found">
      <EmptyState
        headingLevel="h1"
        title="There is no page at this address"
        description="The link may be out of date, or the page may have moved."
      >
        <Button asChild>
          <RouterLink to={paths.home}>Go to the console</RouterLink>
        </Button>
      </EmptyState>
    </div>
  );
}
