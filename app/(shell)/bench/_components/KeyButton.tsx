'use client';

import type { ButtonHTMLAttributes } from 'react';

type Props = ButtonHTMLAttributes<HTMLButtonElement> & { shortcut?: string; tone?: 'primary' | 'quiet' };

// A bench button: at least 44 px tall (WCAG 2.5.5 target size), with its key shown on it.
export function KeyButton({ shortcut, tone = 'primary', className = '', children, ...props }: Props) {
  return (
    <button
      type="button"
      {...props}
      className={`${tone === 'primary' ? 'btn-primary' : 'btn-quiet'} min-h-14 text-lg ${className}`}
      aria-keyshortcuts={shortcut}
    >
      <span>{children}</span>
      {shortcut ? (
        <kbd
          className={`num rounded px-1.5 py-0.5 text-sm ${tone === 'primary' ? 'bg-forge-dark text-brass-light' : 'bg-paper-deep text-ink-soft'}`}
          aria-hidden="true"
        >
          {shortcut.toUpperCase()}
        </kbd>
      ) : null}
    </button>
  );
}
