import { ApiKeyScope } from './api-key-scopes';

/** What a public-API route learns about its caller once ApiKeyGuard has accepted the key. */
export interface ApiPrincipal {
  teamId: string;
  /** The key's row id (a UUID), as shown in the console and the audit log. */
  keyId: string;
  scopes: ApiKeyScope[];
  teamPlan: string;
}
