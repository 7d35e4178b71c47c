import Link from 'next/link';
import { notFound } from 'next/navigation';
import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { orNotFound } from '@/server/http/or-not-found';
import { idParamSchema } from '@/lib/contracts/common';
import { getKit, listKits } from '@/server/services/kits/list-kits';
import { KitEditor } from './kit-editor';

export const metadata = { title: 'Kit' };

export default async function KitPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser('catalog.read', `/kits/${id}`);
  const parsed = idParamSchema.safeParse({ id });
  if (!parsed.success) notFound();
  const kit = await orNotFound(getKit({ kitId: parsed.data.id }));
  const revisions = (await listKits()).filter((k) => k.code === kit.code);
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <p className="text-sm">
          <Link href="/kits" className="text-forge hover:underline">
            Kits
          </Link>
        </p>
        <h1 className="page-title flex flex-wrap items-center gap-3">
          <span className="num">{kit.code}</span>
          <span className="text-ink-soft font-medium">rev {kit.revision}</span>
          {kit.active ? null : <span className="rounded bg-paper-deep px-2 py-1 text-base text-ink-faint">Retired</span>}
        </h1>
        {revisions.length > 1 ? (
          <p className="text-sm text-ink-soft">
            Revisions:{' '}
            {revisions.map((r, i) => (
              <span key={r.id}>
                {i ? ', ' : ''}
                {r.id === kit.id ? (
                  <strong>{r.revision}</strong>
                ) : (
                  <Link href={`/kits/${r.id}`} className="text-forge hover:underline">
                    {r.revision}
                  </Link>
                )}
                {r.active ? '' : ' (retired)'}
              </span>
            ))}
          </p>
        ) : null}
      </header>
      <KitEditor kit={kit} canEdit={can(user.role, 'kits.edit')} />
    </div>
  );
}
