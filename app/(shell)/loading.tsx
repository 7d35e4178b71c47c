export default function Loading() {
  return (
    <div role="status" aria-live="polite" className="space-y-3 animate-pulse">
      <div className="h-8 w-64 rounded bg-paper-deep" />
      <div className="h-32 rounded-lg bg-paper-deep" />
      <span className="sr-only">Loading…</span>
    </div>
  );
}
