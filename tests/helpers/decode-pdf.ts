// Looks at generated PDFs the way a scanner would: rasterise with poppler's pdftoppm, then decode every
// symbol with zxing-wasm, an independent decoder (bwip-js encoded them).
import { execFile } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { prepareZXingModule, readBarcodes } from 'zxing-wasm/reader';

const run = promisify(execFile);
const require = createRequire(import.meta.url);

export interface DecodedSymbol {
  format: string;
  text: string; // zxing's human-readable form: GS1 data as (AI)value…
  raw: string; // the transmitted bytes as latin-1: GS1 separators as GS (ASCII 29)
  symbologyIdentifier: string;
  mirrored: boolean;
}

let ready: Promise<unknown> | undefined;

function zxing(): Promise<unknown> {
  // In Node the module must be handed its wasm file, or it tries to fetch it.
  ready ??= prepareZXingModule({
    overrides: { wasmBinary: readFileSync(require.resolve('zxing-wasm/reader/zxing_reader.wasm')).buffer as ArrayBuffer },
    fireImmediately: true,
  });
  return ready;
}

// Every symbol on every page, pages in order. 300 dpi is what a thermal or laser label printer gives.
export async function decodePdf(pdf: Uint8Array, { dpi = 300 }: { dpi?: number } = {}): Promise<DecodedSymbol[][]> {
  await zxing();
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tallyforge-pdf-'));
  try {
    writeFileSync(path.join(dir, 'in.pdf'), pdf);
    await run('pdftoppm', ['-r', String(dpi), '-gray', '-png', path.join(dir, 'in.pdf'), path.join(dir, 'page')]);
    const pages = readdirSync(dir)
      .filter((f) => f.endsWith('.png'))
      .sort();
    const decoded: DecodedSymbol[][] = [];
    for (const file of pages) {
      const results = await readBarcodes(readFileSync(path.join(dir, file)), { tryHarder: true, maxNumberOfSymbols: 16 });
      decoded.push(
        results
          .filter((r) => r.isValid)
          .map((r) => ({
            format: r.format,
            text: r.text,
            raw: Buffer.from(r.bytes).toString('latin1'),
            symbologyIdentifier: r.symbologyIdentifier,
            mirrored: r.isMirrored,
          })),
      );
    }
    return decoded;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export function isPdf(bytes: Uint8Array): boolean {
  return Buffer.from(bytes.subarray(0, 5)).toString('latin1') === '%PDF-';
}
