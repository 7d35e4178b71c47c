import { requirePageUser } from '@/server/auth/authorize';
import { formatSiteDateTime } from '@/lib/time/site-clock';
import { listMail } from '@/server/services/mail/list-mail';
import { siteTimeZone } from '@/server/services/settings/get-settings';

export const metadata = { title: 'Outbox' };

const STATUS_STYLE: Record<string, string> = { sent: 'text-ok', failed: 'text-fault', queued: 'text-caution' };

export default async function MailPage() {
  await requirePageUser('admin.manage', '/admin/mail');
  const [messages, timeZone] = await Promise.all([listMail({ limit: 100 }), siteTimeZone()]);
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Outbox</h1>
        <p className="text-ink-soft">
          The last 100 e-mails Tallyforge sent, newest first. In a local setup they go to the mail sink, not to real inboxes. One-time links are masked here:
          only the recipient's inbox has them.
        </p>
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
                <time className="text-sm text-ink-faint num" dateTime={m.createdAt}>
                  {formatSiteDateTime(m.createdAt, timeZone)}
                </time>
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
