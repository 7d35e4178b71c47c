import Link from 'next/link';
import { PERMISSIONS, ROLE_LABELS } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';

export const metadata = { title: 'Not for your role' };

export default async function ForbiddenPage({ searchParams }: { searchParams: Promise<{ need?: string }> }) {
  const user = await requirePageUser();
  const { need } = await searchParams;
  const what = need && need in PERMISSIONS ? PERMISSIONS[need as keyof typeof PERMISSIONS] : null;
  return (
    <div className="card max-w-xl" data-testid="forbidden">
      <h1 className="text-xl font-bold">Not available to a {ROLE_LABELS[user.role].toLowerCase()}</h1>
      <p className="mt-2 text-ink-soft">
        {what ? `That page needs the right to: ${what.toLowerCase()}.` : 'That page needs another role.'} Ask an administrator if your work needs it.
      </p>
      <Link href="/" className="btn-quiet mt-4">Back to Today</Link>
    </div>
  );
}
