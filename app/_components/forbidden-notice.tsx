import Link from 'next/link';
import { pagePermission } from '@/lib/page-access';
import { PERMISSIONS, ROLE_LABELS } from '@/lib/roles';
import { requestedPagePath } from '@/server/auth/authorize';
import { getCurrentUser } from '@/server/auth/session';

// What a page refused with 403 says: which right it needs, and who can grant it.
export async function ForbiddenNotice() {
  const [user, path] = await Promise.all([getCurrentUser(), requestedPagePath()]);
  const need = pagePermission(path);
  const label = user ? ROLE_LABELS[user.role].toLowerCase() : null;
  const who = label ? `${/^[aeiou]/.test(label) ? 'an' : 'a'} ${label}` : 'your role';
  return (
    <div className="card max-w-xl" data-testid="forbidden">
      <h1 className="text-xl font-bold">{`Not available to ${who}`}</h1>
      <p className="mt-2 text-ink-soft">
        {need ? `That page needs the right to: ${PERMISSIONS[need].toLowerCase()}.` : 'That page needs another role.'} Ask an administrator if your work needs
        it.
      </p>
      <Link href="/" className="btn-quiet mt-4">
        Back to Today
      </Link>
    </div>
  );
}
