import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrations } from './migrations';

export function createMigrator(sequelize: Sequelize): Umzug<QueryInterface> {
  return new Umzug({
    migrations: migrations.map((m) => ({
      name: m.name,
      up: ({ context }) => m.up({ context }),
      down: ({ context }) => m.down({ context }),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

// Runs pending migrations under a named lock, so two instances starting together do not race.
// The lock lives on one connection: a transaction pins it for GET_LOCK and RELEASE_LOCK alike.
export async function migrateUp(sequelize: Sequelize): Promise<string[]> {
  return sequelize.transaction(async (transaction) => {
    const [[lock]] = (await sequelize.query("SELECT GET_LOCK('tallyforge_migrate', 60) AS got", { transaction })) as [[{ got: number }], unknown];
    if (Number(lock.got) !== 1) throw new Error('could not take the migration lock within 60 s');
    try {
      const done = await createMigrator(sequelize).up();
      return done.map((m) => m.name);
    } finally {
      await sequelize.query("SELECT RELEASE_LOCK('tallyforge_migrate')", { transaction });
    }
  });
}
