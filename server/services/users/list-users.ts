import 'server-only';
import { User } from '@/models';
import { getDb } from '../../db';
import type { UserDto } from '@/lib/contracts/users';
import { toUserDto } from './user-dto';

export async function listUsers(): Promise<UserDto[]> {
  getDb();
  const users = await User.findAll({ order: [['name', 'ASC']] });
  return users.map(toUserDto);
}
