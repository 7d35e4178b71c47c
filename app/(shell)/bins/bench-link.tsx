import Link from 'next/link';

// Bin counts happen at the bench; it opens with the bin already chosen.
export function BenchLink({ code, className = 'text-forge hover:underline' }: { code: string; className?: string }) {
  return (
    <Link href={`/bench?bin=${encodeURIComponent(code)}`} className={className} aria-label={`Count bin ${code} at the bench`}>
      Count at the bench
    </Link>
  );
}
