import Link from 'next/link';
import { pageRange, type PageOf } from '@/lib/page-range';

interface PagerProps {
  /** What the list holds, for the landmark: "Pages of the bins". */
  label: string;
  at: PageOf;
  shown: number;
  hrefFor: (page: number) => string;
  earlier?: string;
  later?: string;
}

// Links to the pages either side of this one, rendered on the server: they work before any script runs.
export function Pager({ label, at, shown, hrefFor, earlier = 'Previous', later = 'Next' }: PagerProps) {
  const { pages } = pageRange(at, shown);
  if (pages <= 1 && at.page <= 1) return null;
  return (
    <nav aria-label={label} className="flex items-center gap-3 text-sm">
      {at.page > 1 ? (
        <Link href={hrefFor(Math.min(at.page - 1, pages))} className="btn-quiet">
          {earlier}
        </Link>
      ) : null}
      <span className="text-ink-soft">
        Page {at.page} of {pages}
      </span>
      {at.page < pages ? (
        <Link href={hrefFor(at.page + 1)} className="btn-quiet">
          {later}
        </Link>
      ) : null}
    </nav>
  );
}
