// Direct database access for tests that build their own world (the same models the app uses).
import { randomUUID } from 'node:crypto';
import type { Sequelize } from 'sequelize';
import { initModels, User } from '../../models';
import { createSequelize } from '../../models/sequelize';
import type { Role } from '../../lib/roles';
import { hashPassword } from '../../server/auth/passwords';

let db: Sequelize | undefined;

export function testDb(): Sequelize {
  if (!db) {
    db = createSequelize({
      host: process.env.DB_HOST ?? '127.0.0.1',
      port: Number(process.env.DB_PORT ?? 3308),
      database: process.env.DB_NAME ?? 'tallyforge_test',
      username: process.env.DB_USER ?? 'tallyforge',
      password: process.env.DB_PASSWORD ?? '',
      poolMax: 5,
    });
    initModels(db);
  }
  return db;
}

export const TEST_PASSWORD = 'correct horse battery';
let cachedHash: Promise<string> | undefined;

export function unique(prefix: string): string {
  return `${prefix}-${randomUUID().slice(0, 8)}`;
}

// A signed-up user with a unique e-mail; the password is TEST_PASSWORD.
export async function createUser(role: Role, overrides: Partial<{ name: string; active: boolean; email: string }> = {}): Promise<User> {
  testDb();
  cachedHash ??= hashPassword(TEST_PASSWORD);
  return User.create({
    email: overrides.email ?? `${unique(role)}@example.test`,
    name: overrides.name ?? `Test ${role}`,
    role,
    passwordHash: await cachedHash,
    active: overrides.active ?? true,
  });
}
