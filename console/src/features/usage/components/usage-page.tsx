import { Card } from '@radix-ui/themes';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function UsagePage() {
  return (
    <>
      <PageHeader title="Usage" description="Requests and fitted observations per day, per key, against your plan's limits." />
      <Card size="3" className="ll-panel">
        <EmptyState
          title="No usage recorded"
          description="As soon as a key sends its first request, daily counts are charted here."
        />
      </Card>
    </>
  );
}
