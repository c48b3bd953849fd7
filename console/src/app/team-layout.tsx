import { useEffect, useMemo } from 'react';
import { useParams } from 'react-router-dom';
import { rememberTeam } from '@/app/remembered-team';
import { AppShell } from '@/app/shell/app-shell';
import { NotFoundPage } from '@/app/not-found-page';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { CurrentTeamProvider, type CurrentTeam } from '@/lib/current-team';
import { useSession } from '@/features/auth/api/get-session';
import { useTeam } from '@/features/team/api/get-team';

// /teams/:teamId/…: checks that the signed-in person belongs to the team, loads it once and hands it
// to every page below through the current-team context.
export function TeamLayout() {
  const { teamId = '' } = useParams();
  const session = useSession();
  const isMember = session.data?.memberships.some((membership) => membership.teamId === teamId) ?? false;
  const team = useTeam(teamId, isMember);

  useEffect(() => {
    if (isMember) rememberTeam(teamId);
  }, [isMember, teamId]);

  const value = useMemo<CurrentTeam | null>(
    () => (team.data && session.data ? { team: team.data, account: session.data.account } : null),
    [team.data, session.data],
  );

  if (!isMember) return <NotFoundPage />;
  if (team.isError) {
    return (
      <div className="ll-guard-error">
        <ProblemCallout error={team.error} />
      </div>
    );
  }
  if (value === null) return <PageLoading />;
  return (
    <CurrentTeamProvider value={value}>
      <AppShell />
    </CurrentTeamProvider>
  );
}
