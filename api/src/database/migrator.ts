import { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrationList } from './migrations';

/** The umzug runner: applied migrations are recorded in `schema_migrations`. */
export function createMigrator(sequelize: Sequelize, log: (message: string) => void = () => undefined) {
  return new Umzug<QueryInterface>({
    migrations: migrationList(),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: {
      info: (event) => log(JSON.stringify(event)),
      warn: (event) => log(JSON.stringify(event)),
      error: (event) => log(JSON.stringify(event)),
      debug: () => undefined,
    },
  });
}
