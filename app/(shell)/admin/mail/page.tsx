import { requirePageUser } from '@/server/auth/authorize';
import { listMail } from '@/server/services/mail/list-mail';

export const metadata = { title: 'Outbox' };

const STATUS_STYLE: Record<string, string> = { sent: 'text-ok', failed: 'text-fault', queued: 'text-caution' };

export default async function MailPage() {
  await requirePageUser('admin.manage', '/admin/mail');
  const messages = await listMail({ limit: 100 });
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Outbox</h1>
        <p className="text-ink-soft">The last 100 e-mails Tallyforge sent, newest first. In a local setup they go to the mail sink, not to real inboxes.</p>
      </header>
      {messages.length === 0 ? <p className="card text-ink-soft">No e-mail has been sent yet.</p> : null}
      <ul className="space-y-3">
        {messages.map((m) => (
          <li key={m.id} className="card">
            <details>
              <summary className="cursor-pointer flex flex-wrap gap-x-4 gap-y-1 items-baseline">
                <span className="font-medium">{m.subject}</span>
                <span className="text-sm text-ink-soft">to {m.to}</span>
                <span className={`text-sm font-medium ${STATUS_STYLE[m.status] ?? ''}`}>{m.status}</span>
                <time className="text-sm text-ink-faint num" dateTime={m.createdAt}>{m.createdAt.replace('T', ' ').slice(0, 16)} UTC</time>
              </summary>
              {m.error ? <p className="mt-2 text-sm text-fault">{m.error}</p> : null}
              <pre className="mt-3 whitespace-pre-wrap text-sm bg-paper p-3 rounded">{m.text}</pre>
            </details>
          </li>
        ))}
      </ul>
    </div>
  );
}
