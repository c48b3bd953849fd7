import { Navigate } from 'react-router-dom';
import { readRememberedTeam } from '@/app/remembered-team';
import { SignOutLink } from '@/app/sign-out-link';
import { PageLoading } from '@/components/page-loading';
import { teamPath } from '@/config/paths';
import { useSession } from '@/features/auth/api/get-session';
import { NoTeamPage } from '@/features/team/components/no-team-page';

// The console's front door: the team opened last time, else the first team, else a way to start one.
export function HomeRedirect() {
  const session = useSession();
  if (!session.data) return <PageLoading />;
  const memberships = session.data.memberships;
  const remembered = readRememberedTeam();
  const chosen = memberships.find((membership) => membership.teamId === remembered) ?? memberships[0];
  if (chosen === undefined) return <NoTeamPage footer={<SignOutLink />} />;
  return <Navigate to={teamPath(chosen.teamId)} replace />;
}
