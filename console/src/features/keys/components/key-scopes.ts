import type { components } from '@/lib/api-schema';

export type ApiKeyScope = components['schemas']['CreateApiKeyDto']['scopes'][number];

// In the order the create form lists them; the descriptions say what a caller with the scope may do.
export const keyScopes: ReadonlyArray<{ scope: ApiKeyScope; label: string; description: string }> = [
  { scope: 'fits:run', label: 'Run fits', description: 'Send regression requests.' },
  { scope: 'datasets:read', label: 'Read datasets', description: 'List and download stored datasets.' },
  { scope: 'datasets:write', label: 'Write datasets', description: 'Upload and delete datasets.' },
  { scope: 'usage:read', label: 'Read usage', description: "See the team's metered usage." },
];
