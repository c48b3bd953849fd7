// Route paths of the console, in one place so links and routes cannot drift apart. Pages that belong to
// a team carry its id in the address, so a link or a reload always opens the same team.

export const paths = {
  home: '/',
  signIn: '/sign-in',
  resetPassword: '/reset-password',
  acceptInvitation: '/invitations/accept',
  team: '/teams/:teamId',
} as const;

export const teamSections = {
  overview: '',
  playground: 'playground',
  datasets: 'datasets',
  apiKeys: 'api-keys',
  members: 'team',
  usage: 'usage',
  billing: 'billing',
} as const;

export type TeamSection = keyof typeof teamSections;

export function teamPath(teamId: string, section: TeamSection = 'overview'): string {
  const base = `/teams/${encodeURIComponent(teamId)}`;
  const segment = teamSections[section];
  return segment === '' ? base : `${base}/${segment}`;
}

/** Where to go after signing in: a page inside the console, never an address elsewhere. */
export function safeNextPath(candidate: string | null | undefined): string {
  if (!candidate || !candidate.startsWith('/') || candidate.startsWith('//') || candidate.startsWith('/\\')) {
    return paths.home;
  }
  return candidate;
}
