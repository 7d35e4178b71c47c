import { requirePageUser } from '@/server/auth/authorize';
import { listUsers } from '@/server/services/users/list-users';
import { PeopleBoard } from './people-board';

export const metadata = { title: 'People' };

export default async function UsersPage() {
  const me = await requirePageUser('admin.manage', '/admin/users');
  const users = await listUsers();
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">People</h1>
        <p className="text-ink-soft">Invite people, set their role, and switch accounts off when someone leaves.</p>
      </header>
      <PeopleBoard initialUsers={users} meId={me.id} />
    </div>
  );
}
