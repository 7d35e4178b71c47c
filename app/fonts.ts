import localFont from 'next/font/local';

// The same TTF files are embedded in label PDFs (see labels/), so screen and paper match.
export const sans = localFont({
  src: [
    { path: '../fonts/ClearSans-Regular.ttf', weight: '400', style: 'normal' },
    { path: '../fonts/ClearSans-Medium.ttf', weight: '500', style: 'normal' },
    { path: '../fonts/ClearSans-Bold.ttf', weight: '700', style: 'normal' },
  ],
  variable: '--font-sans',
  display: 'swap',
});

export const mono = localFont({
  src: [
    { path: '../fonts/JetBrainsMono-Regular.ttf', weight: '400', style: 'normal' },
    { path: '../fonts/JetBrainsMono-Bold.ttf', weight: '700', style: 'normal' },
  ],
  variable: '--font-mono',
  display: 'swap',
});
