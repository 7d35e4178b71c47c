import 'server-only';
import type { Sequelize } from 'sequelize';
import { initModels } from '@/models';
import { createSequelize } from '@/models/sequelize';
import { getEnv } from './env';

// One Sequelize instance per module copy. Next may bundle this module into more than one server
// layer, each with its own copy of the model classes, so the instance must not be shared across
// copies through globalThis: each copy initialises its own classes.
let instance: Sequelize | undefined;

export function getDb(): Sequelize {
  if (!instance) {
    const env = getEnv();
    const db = createSequelize({
      host: env.DB_HOST,
      port: env.DB_PORT,
      database: env.DB_NAME,
      username: env.DB_USER,
      password: env.DB_PASSWORD,
      poolMax: env.DB_POOL_MAX,
    });
    initModels(db);
    instance = db;
  }
  return instance;
}
