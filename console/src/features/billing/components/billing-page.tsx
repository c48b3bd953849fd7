import { Badge, Card } from '@radix-ui/themes';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function BillingPage() {
  return (
    <>
      <PageHeader
        title="Billing"
        description="Plan, invoices and payment details, managed by the team's billing owners."
        badge={
          <Badge color="amber" variant="soft" radius="full">
            Coming soon
          </Badge>
        }
      />
      <Card size="3" className="ll-panel">
        <EmptyState
          title="Billing is on its way"
          description="Billing owners will be able to choose a plan, download invoices and update payment details from this page."
        />
      </Card>
    </>
  );
}
