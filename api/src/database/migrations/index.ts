import { QueryInterface } from 'sequelize';
import { RunnableMigration } from 'umzug';
import * as createTeams from './0001-create-teams';
import * as createAccounts from './0002-create-accounts';
import * as createMembershipsAndInvitations from './0003-create-memberships-and-invitations';
import * as createApiKeys from './0004-create-api-keys';
import * as createAuditEvents from './0005-create-audit-events';
import * as createMailOutbox from './0006-create-mail-outbox';
import * as createDatasets from './0020-create-datasets';
import * as createMetering from './0021-create-metering';

/**
 * Migrations in the order they run. Listed explicitly (not globbed) so the same list works from compiled
 * JavaScript and from TypeScript under the test runner. A shipped migration is never edited: add a file.
 */
const ORDERED = [
  { name: '0001-create-teams', module: createTeams },
  { name: '0002-create-accounts', module: createAccounts },
  { name: '0003-create-memberships-and-invitations', module: createMembershipsAndInvitations },
  { name: '0004-create-api-keys', module: createApiKeys },
  { name: '0005-create-audit-events', module: createAuditEvents },
  { name: '0006-create-mail-outbox', module: createMailOutbox },
  { name: '0020-create-datasets', module: createDatasets },
  { name: '0021-create-metering', module: createMetering },
];

export function migrationList(): RunnableMigration<QueryInterface>[] {
  return ORDERED.map(({ name, module }) => ({ name, up: module.up, down: module.down }));
}
