import Link from 'next/link';
import { Wordmark } from './_components/mark';

export default function NotFound() {
  return (
    <main className="min-h-screen grid place-items-center p-6">
      <div className="card max-w-md text-center">
        <div className="flex justify-center mb-4">
          <Wordmark />
        </div>
        <h1 className="text-xl font-bold">Nothing here</h1>
        <p className="mt-2 text-ink-soft">That address does not lead to a page. It may have moved, or the link was mistyped.</p>
        <Link href="/" className="btn-primary mt-4">
          Back to Today
        </Link>
      </div>
    </main>
  );
}
