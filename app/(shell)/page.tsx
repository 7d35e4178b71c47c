import Link from 'next/link';
import { PERMISSIONS, ROLE_LABELS, ROLE_PERMISSIONS } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { getWaiting } from '@/server/services/today/get-waiting';
import { Cautions } from '../_components/cautions';

export const metadata = { title: 'Today' };

export default async function TodayPage() {
  const user = await requirePageUser();
  const waiting = await getWaiting(user);
  const allowed = Object.entries(ROLE_PERMISSIONS).filter(([, roles]) => roles.includes(user.role));
  return (
    <div className="space-y-6">
      <header>
        <p className="text-sm text-ink-faint">{ROLE_LABELS[user.role]}</p>
        <h1 className="page-title">Good to see you, {user.name.split(' ')[0]}</h1>
      </header>
      <section aria-labelledby="waiting-title">
        <h2 id="waiting-title" className="text-lg font-bold mb-3">
          Waiting for you
        </h2>
        {waiting.length === 0 ? (
          <p className="card text-ink-soft" data-testid="nothing-waiting">
            Nothing is waiting for you right now.
          </p>
        ) : (
          <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {waiting.map((item) => (
              <li key={item.key}>
                <Link href={item.href} className="card block hover:border-forge" data-testid={`waiting-${item.key}`}>
                  <span className="num text-4xl font-bold text-forge">{item.count}</span>
                  <span className="block font-medium mt-1">{item.title}</span>
                  <span className="block text-sm text-ink-faint">{item.detail}</span>
                </Link>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="can-title" className="card">
        <h2 id="can-title" className="font-bold mb-2">
          What your role can do
        </h2>
        <ul className="grid gap-x-8 gap-y-1 lg:grid-cols-2 text-sm text-ink-soft list-disc pl-5">
          {allowed.map(([permission]) => (
            <li key={permission}>{PERMISSIONS[permission as keyof typeof PERMISSIONS]}</li>
          ))}
        </ul>
      </section>
      <Cautions />
    </div>
  );
}
