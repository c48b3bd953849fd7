import { QueryInterface } from 'sequelize';
import { RunnableMigration } from 'umzug';
import * as createTeams from './0001-create-teams';

/**
 * Migrations in the order they run. Listed explicitly (not globbed) so the same list works from compiled
 * JavaScript and from TypeScript under the test runner. A shipped migration is never edited: add a file.
 */
const ORDERED = [{ name: '0001-create-teams', module: createTeams }];

export function migrationList(): RunnableMigration<QueryInterface>[] {
  return ORDERED.map(({ name, module }) => ({ name, up: module.up, down: module.down }));
}
