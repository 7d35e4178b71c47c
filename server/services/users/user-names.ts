import 'server-only';
import { Op } from 'sequelize';
import { User } from '@/models';
import { getDb } from '../../db';

// Display names for the people a page mentions (who recorded, who counted), by id.
export async function userNames(ids: readonly number[]): Promise<Record<number, string>> {
  getDb();
  const unique = [...new Set(ids)];
  if (!unique.length) return {};
  const users = await User.findAll({ where: { id: { [Op.in]: unique } }, attributes: ['id', 'name'] });
  return Object.fromEntries(users.map((u) => [u.id, u.name]));
}
