/**
 * First-load JavaScript of the /bench route, read from the Next build in .next/:
 * rootMainFiles of .next/build-manifest.json (the runtime every page loads) plus the route's
 * entryJSFiles (app/layout, the (shell) layout and the bench page) from the route's
 * client reference manifest .next/server/app/(shell)/bench/page_client-reference-manifest.js.
 * polyfillFiles are left out: they load only in browsers without ES modules.
 * Chunks fetched later by dynamic import() (the trace's chart) are listed apart.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

export interface BundleFigures {
  route: string;
  files: number;
  bytes: number;
  gzipBytes: number;
  chunks: Array<{ file: string; bytes: number; gzipBytes: number }>;
  dataGridInFirstLoad: boolean;
  chartInFirstLoad: boolean;
  lazyChartChunk: { file: string; bytes: number; gzipBytes: number } | null;
}

export function measureBundle(root: string, route = '/(shell)/bench/page'): BundleFigures {
  const next = path.join(root, '.next');
  const build = JSON.parse(readFileSync(path.join(next, 'build-manifest.json'), 'utf8')) as { rootMainFiles: string[] };
  const manifestFile = path.join(next, 'server/app', `${route}_client-reference-manifest.js`);
  if (!existsSync(manifestFile)) throw new Error(`no client reference manifest for ${route}: run next build first`);
  // The manifest is a script assigning globalThis.__RSC_MANIFEST[route] = {...}.
  const sandbox: { __RSC_MANIFEST?: Record<string, { entryJSFiles: Record<string, string[]> }> } = {};
  new Function('globalThis', readFileSync(manifestFile, 'utf8'))(sandbox);
  const entries = sandbox.__RSC_MANIFEST![route].entryJSFiles;
  const segments = Object.keys(entries).filter((k) => k === '[project]/app/layout' || k === '[project]/app/(shell)/layout' || k === `[project]/app${route}`);
  const files = [...new Set([...build.rootMainFiles, ...segments.flatMap((k) => entries[k])])];
  const sizeOf = (file: string) => {
    const body = readFileSync(path.join(next, file));
    return { file, bytes: body.length, gzipBytes: gzipSync(body, { level: 9 }).length };
  };
  const chunks = files.map(sizeOf);
  const text = files.map((f) => readFileSync(path.join(next, f), 'utf8')).join('\n');
  // uPlot's source names itself in its CSS class prefix "u-" and its constructor; ag-grid in its module names.
  const chart = (t: string) => t.includes('uplot') || t.includes('u-over');
  const chunkDir = path.join(next, 'static/chunks');
  const lazy = readdirSync(chunkDir)
    .filter((f) => f.endsWith('.js') && !files.includes(`static/chunks/${f}`))
    .find((f) => chart(readFileSync(path.join(chunkDir, f), 'utf8')));
  return {
    route: '/bench',
    files: files.length,
    bytes: chunks.reduce((a, c) => a + c.bytes, 0),
    gzipBytes: chunks.reduce((a, c) => a + c.gzipBytes, 0),
    chunks,
    dataGridInFirstLoad: /ag-grid|AgGridReact|agGrid/.test(text),
    chartInFirstLoad: chart(text),
    lazyChartChunk: lazy ? sizeOf(`static/chunks/${lazy}`) : null,
  };
}
