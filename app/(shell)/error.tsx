'use client';

export default function ShellError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="card border-fault">
      <h1 className="text-xl font-bold text-fault">This page could not be shown</h1>
      <p className="mt-2 text-ink-soft">
        Nothing you entered was lost on the server. Try again; if it keeps happening, tell your administrator
        {error.digest ? ` (reference ${error.digest})` : ''}.
      </p>
      <button type="button" className="btn-primary mt-4" onClick={reset}>
        Try again
      </button>
    </div>
  );
}
