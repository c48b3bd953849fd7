import { Card } from '@radix-ui/themes';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function DatasetsPage() {
  return (
    <>
      <PageHeader
        title="Datasets"
        description="Observations stored for reuse, so requests can name a dataset instead of resending every row."
      />
      <Card size="3" className="ll-panel">
        <EmptyState
          title="No datasets yet"
          description="Datasets your team uploads appear here with their columns, row counts and the fits that used them."
        />
      </Card>
    </>
  );
}
