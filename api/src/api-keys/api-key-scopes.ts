/**
 * The scopes an API key can carry: the one list, used by the DTOs, the guard and the docs. A key holds
 * only the scopes chosen at creation; rotation copies them.
 */
export const API_KEY_SCOPES = ['fits:run', 'datasets:read', 'datasets:write', 'usage:read'] as const;
export type ApiKeyScope = (typeof API_KEY_SCOPES)[number];

export const API_KEY_SCOPE_DESCRIPTIONS: Record<ApiKeyScope, string> = {
  'fits:run': 'Run regression fits',
  'datasets:read': 'List and read datasets',
  'datasets:write': 'Upload, replace and delete datasets',
  'usage:read': "Read the team's metered usage",
};
