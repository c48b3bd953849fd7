// Console calls to the public API name the team they act for; the API checks the caller's role in it.
export function teamHeader(teamId: string): Record<string, string> {
  return { 'X-Leastline-Team': teamId };
}
