import type { ReactNode } from 'react';
import { Mark } from '../_components/mark';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="min-h-screen grid lg:grid-cols-[1fr_1.1fr]">
      <section className="bg-ink text-paper p-8 lg:p-14 flex flex-col justify-between">
        <div className="flex items-center gap-3">
          <Mark size={44} />
          <span className="text-2xl font-bold">
            Tally<span className="text-brass">forge</span>
          </span>
        </div>
        <div className="hidden lg:block max-w-md">
          <p className="text-3xl font-bold leading-tight">Every kit counted by weight, every count honest about its doubt.</p>
          <p className="mt-4 text-paper-line/80">Bench counting, build orders, bins and labels, and the calibration records that keep them true.</p>
        </div>
        <p className="hidden lg:block text-xs text-paper-line/60">Counts for trade need a legally verified scale.</p>
      </section>
      <section className="flex items-center justify-center p-6">{children}</section>
    </div>
  );
}
