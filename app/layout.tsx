import type { Metadata, Viewport } from 'next';
import type { ReactNode } from 'react';
import { mono, sans } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Tallyforge', template: '%s · Tallyforge' },
  description: 'Count parts by weight and build kits that are right the first time.',
};

export const viewport: Viewport = { width: 'device-width', initialScale: 1, themeColor: '#1f5a70' };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-screen">{children}</body>
    </html>
  );
}
