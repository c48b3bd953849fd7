import { Card } from '@radix-ui/themes';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function ApiKeysPage() {
  return (
    <>
      <PageHeader
        title="API keys"
        description="Keys identify the services that call the API; each one is metered and can be revoked on its own."
      />
      <Card size="3" className="ll-panel">
        <EmptyState
          title="No API keys yet"
          description="Keys created for your team are listed here with their prefix, creator and last use. The secret part is shown once, at creation."
        />
      </Card>
    </>
  );
}
