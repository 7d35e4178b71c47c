import 'server-only';
import { getDb } from '../../db';

export interface Health {
  app: 'ok';
  database: 'ok' | 'unreachable';
}

export async function checkHealth(): Promise<Health> {
  try {
    await getDb().query('SELECT 1');
    return { app: 'ok', database: 'ok' };
  } catch {
    return { app: 'ok', database: 'unreachable' };
  }
}
