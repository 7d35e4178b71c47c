import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { LabelFont } from './label-content';

// The shipped TTFs (fonts/ at the project root; the app, scripts and tests all run from there). TTF, never WOFF2: pdf-lib's subsetter needs TrueType outlines.
const FILES: Record<LabelFont, string> = {
  sans: 'ClearSans-Regular.ttf',
  sansBold: 'ClearSans-Bold.ttf',
  mono: 'JetBrainsMono-Regular.ttf',
  monoBold: 'JetBrainsMono-Bold.ttf',
};

const cache = new Map<LabelFont, Uint8Array>();

export function fontBytes(font: LabelFont): Uint8Array {
  let bytes = cache.get(font);
  if (!bytes) {
    bytes = readFileSync(path.join(process.cwd(), 'fonts', FILES[font]));
    cache.set(font, bytes);
  }
  return bytes;
}
