import { afterAll, describe, expect, it } from 'vitest';
import { initModels } from '../../models';
import { createScratchDatabase, schemaShape } from '../helpers/scratch-database';

// The models are what the app reads and writes; the migrations are what a database really has.
// Building a schema from the models alone (sync) and comparing it column by column with the
// migrated test database catches a model changed without a migration, and the reverse.
describe('models and migrations agree', () => {
  let drop: (() => Promise<void>) | undefined;
  afterAll(async () => drop?.());

  it('gives the same columns from the models as from the migrations', { timeout: 60_000 }, async () => {
    const synced = await createScratchDatabase('synced');
    drop = synced.drop;
    initModels(synced.db);
    await synced.db.sync();
    const fromModels = await schemaShape(synced.name);
    const fromMigrations = await schemaShape(process.env.DB_NAME ?? 'tallyforge_test');
    expect(fromModels.columns).toEqual(fromMigrations.columns);
  });
});
