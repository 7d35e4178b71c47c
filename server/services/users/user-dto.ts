import 'server-only';
import type { User } from '@/models';
import type { UserDto } from '@/lib/contracts/users';

export function toUserDto(user: User): UserDto {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    active: user.active,
    status: !user.active ? 'inactive' : user.passwordHash ? 'active' : 'invited',
    version: user.version,
    createdAt: user.createdAt.toISOString(),
  };
}
