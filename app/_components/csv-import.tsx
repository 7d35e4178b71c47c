'use client';

import { useState } from 'react';
import { apiFetch } from './api-client';

interface ImportRow {
  line: number;
  errors: Record<string, string>;
}

interface Column<Row> {
  key: keyof Row & string;
  column: string; // the CSV column its errors are reported under
  label: string;
}

interface Props<Row extends ImportRow> {
  title: string;
  endpoint: string;
  header: string;
  hint: string;
  columns: Column<Row>[];
  onCommitted: (rows: number) => void;
}

// Check first, then import: the server reads the whole file, shows each row with its problems,
// and writes all of it or none of it.
export function CsvImport<Row extends ImportRow>({ title, endpoint, header, hint, columns, onCommitted }: Props<Row>) {
  const [text, setText] = useState('');
  const [checked, setChecked] = useState<{ text: string; rows: Row[]; valid: boolean } | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const id = endpoint.replace(/\W+/g, '-');

  async function send(commit: boolean) {
    setBusy(true);
    setMessage(null);
    const res = await apiFetch<{ rows: Row[]; valid: boolean; committed: boolean }>(endpoint, { method: 'POST', body: { csv: text, commit } });
    setBusy(false);
    if (!res.ok) {
      setChecked(null);
      setMessage([res.message, ...Object.values(res.fields)].join(': '));
      return;
    }
    if (res.data.committed) {
      setChecked(null);
      setText('');
      onCommitted(res.data.rows.length);
      return;
    }
    setChecked({ text, rows: res.data.rows, valid: res.data.valid });
  }

  const bad = checked?.rows.filter((r) => Object.keys(r.errors).length) ?? [];
  const ready = checked?.valid && checked.text === text;
  return (
    <section className="card space-y-3" aria-labelledby={`${id}-title`}>
      <h2 id={`${id}-title`} className="font-bold">
        {title}
      </h2>
      <p className="text-sm text-ink-soft">
        First line: <code className="num bg-paper-deep px-1 rounded">{header}</code>. {hint}
      </p>
      <div className="flex flex-wrap gap-3 items-center">
        <label className="btn-quiet cursor-pointer">
          Choose a file
          <input type="file" accept=".csv,text/csv" className="sr-only" onChange={async (e) => setText((await e.target.files?.[0]?.text()) ?? '')} />
        </label>
        <span className="text-sm text-ink-faint">or paste it below</span>
      </div>
      <label htmlFor={`${id}-text`} className="field-label">
        CSV text
      </label>
      <textarea id={`${id}-text`} className="field num min-h-32 py-2 text-sm" value={text} onChange={(e) => setText(e.target.value)} spellCheck={false} />
      <div className="flex flex-wrap gap-3 items-center">
        <button type="button" className="btn-quiet" disabled={busy || !text.trim()} onClick={() => send(false)}>
          {busy ? 'Checking…' : 'Check file'}
        </button>
        <button type="button" className="btn-primary" disabled={busy || !ready} onClick={() => send(true)}>
          {checked && ready ? `Import all ${checked.rows.length} rows` : 'Import'}
        </button>
        <p role="status" aria-live="polite" className="text-sm" data-testid={`${id}-status`}>
          {message ? (
            <span className="text-fault">{message}</span>
          ) : checked ? (
            checked.valid ? (
              <span className="text-ok">All {checked.rows.length} rows are good. Nothing is written until you import.</span>
            ) : (
              <span className="text-fault">
                {bad.length} of {checked.rows.length} rows need fixing; nothing will be imported until every row is good.
              </span>
            )
          ) : null}
        </p>
      </div>
      {checked ? (
        <div className="overflow-x-auto">
          <table className="w-full text-sm">
            <caption className="sr-only">Rows as read from the file</caption>
            <thead>
              <tr className="text-left border-b border-paper-line">
                <th scope="col" className="py-2 pr-3">
                  Line
                </th>
                {columns.map((c) => (
                  <th key={c.key} scope="col" className="py-2 pr-3">
                    {c.label}
                  </th>
                ))}
                <th scope="col" className="py-2">
                  Problems
                </th>
              </tr>
            </thead>
            <tbody>
              {checked.rows.map((row) => {
                const problems = Object.entries(row.errors);
                return (
                  <tr key={row.line} className={`border-b border-paper-line align-top ${problems.length ? 'bg-fault-light/60' : ''}`}>
                    <td className="py-2 pr-3 num">{row.line}</td>
                    {columns.map((c) => (
                      <td key={c.key} className={`py-2 pr-3 ${row.errors[c.column] ? 'text-fault font-medium' : ''}`}>
                        {String(row[c.key] ?? '')}
                      </td>
                    ))}
                    <td className="py-2">
                      {problems.length ? (
                        problems.map(([col, msg]) => (
                          <span key={col} className="block text-fault">
                            {col}: {msg}
                          </span>
                        ))
                      ) : (
                        <span className="text-ok">good</span>
                      )}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      ) : null}
    </section>
  );
}
