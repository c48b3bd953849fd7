import { PageHeader } from '@/components/page-header';
import { useCurrentTeam } from '@/lib/current-team';
import { roleAllows } from '@/lib/permissions';
import { AuditLogSection } from '@/features/team/components/audit-log-section';
import { InvitationsSection } from '@/features/team/components/invitations-section';
import { MembersSection } from '@/features/team/components/members-section';
import { OwnershipSection } from '@/features/team/components/ownership-section';
import { TeamSettingsSection } from '@/features/team/components/team-settings-section';
import '@/features/team/components/team-page.css';

export function TeamPage() {
  const { team } = useCurrentTeam();
  const role = team.yourRole;

  return (
    <>
      <PageHeader
        title="Team"
        description={
          roleAllows(role, 'members:manage')
            ? 'Who belongs to this team, what each person may do, and what has happened.'
            : 'Who belongs to this team and what each person may do. Owners and admins make changes.'
        }
      />
      <MembersSection />
      {roleAllows(role, 'invitations:manage') ? <InvitationsSection /> : null}
      <TeamSettingsSection />
      {roleAllows(role, 'team:transfer-ownership') ? <OwnershipSection /> : null}
      {roleAllows(role, 'audit:read') ? <AuditLogSection /> : null}
    </>
  );
}
