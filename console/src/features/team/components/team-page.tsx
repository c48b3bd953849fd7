import { Card } from '@radix-ui/themes';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export function TeamPage() {
  return (
    <>
      <PageHeader title="Team" description="Who belongs to this team and what each person is allowed to do." />
      <Card size="3" className="ll-panel">
        <EmptyState
          title="No members to show"
          description="After you sign in, the members of your team and their roles (admin, billing owner, developer) appear here, along with pending invitations."
        />
      </Card>
    </>
  );
}
