// Who a playground call is made as: the signed-in console session acting for the current team (the
// API checks the role), or an API key pasted for this page only (never stored).

export type PlaygroundAuth = { mode: 'session'; teamId: string } | { mode: 'key'; apiKey: string };

export function authHeaders(auth: PlaygroundAuth): Record<string, string> {
  return auth.mode === 'session' ? { 'X-Leastline-Team': auth.teamId } : { Authorization: `Bearer ${auth.apiKey.trim()}` };
}
