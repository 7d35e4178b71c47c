import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { PDFDict, PDFDocument, PDFName, PDFRawStream, type PDFRef } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { decodePdf, isPdf } from '../tests/helpers/decode-pdf';
import { GROUP_SEPARATOR } from './gs1-element-strings';
import { renderLabels } from './render-labels';
import { STOCK_IDS, LABEL_STOCKS } from './stocks';

const bins = [
  {
    binCode: 'K-04-2-07',
    partNumber: 'SCR-M3X8-A2',
    description: 'Pan head screw M3 × 8, A2 stainless, cross recess',
    partUrl: 'http://127.0.0.1:3000/parts/12345',
  },
  { binCode: 'AB-99-9-99', partNumber: 'WSH-M3', description: 'Washer', partUrl: 'https://tallyforge.example.com/parts/7' },
];
const kit = { kitCode: 'ACT-20-ENDCAP', revision: 'B', orderNumber: 'BO-2026-00042', quantity: 50, description: 'End-cap kit for the 20 mm actuator' };

function byFormat(symbols: Array<{ format: string; text: string; raw: string; symbologyIdentifier: string; mirrored: boolean }>) {
  return [...symbols].sort((a, b) => a.format.localeCompare(b.format) || a.text.localeCompare(b.text));
}

describe('rendered label PDFs, read back by an independent decoder (zxing-wasm at 300 dpi)', () => {
  for (const stock of STOCK_IDS) {
    it(`bin labels on ${stock}: the Code 128 is exactly the bin code, the QR the part page`, async () => {
      const { pdf, pages } = await renderLabels({ template: 'bin', stock, title: 'Bin labels', items: bins });
      expect(isPdf(pdf)).toBe(true);
      const decoded = (await decodePdf(pdf)).flat();
      expect(pages).toBe(LABEL_STOCKS[stock].sheet ? 1 : 2);
      // Code 128 symbology identifier ]C0: no FNC1, plain data (ISO/IEC 15417).
      expect(byFormat(decoded).map((d) => [d.format, d.text, d.symbologyIdentifier, d.mirrored])).toEqual([
        ['Code128', 'AB-99-9-99', ']C0', false],
        ['Code128', 'K-04-2-07', ']C0', false],
        ['QRCode', 'http://127.0.0.1:3000/parts/12345', ']Q1', false],
        ['QRCode', 'https://tallyforge.example.com/parts/7', ']Q1', false],
      ]);
    });
  }

  it('part labels: the Code 128 is the part number and the QR the part page', async () => {
    const { pdf } = await renderLabels({
      template: 'part',
      stock: '2x1in',
      title: 'Part labels',
      items: [{ partNumber: 'SCR-M3X8-A2', description: 'Pan head screw', partUrl: 'http://127.0.0.1:3000/parts/12' }],
    });
    const [page] = await decodePdf(pdf);
    expect(byFormat(page).map((d) => [d.format, d.text])).toEqual([
      ['Code128', 'SCR-M3X8-A2'],
      ['QRCode', 'http://127.0.0.1:3000/parts/12'],
    ]);
  });

  for (const stock of ['4x6in', '4x2in'] as const) {
    it(`kit labels on ${stock}: GS1-128 and GS1 DataMatrix decode to the AIs, with FNC1 leading and separating`, async () => {
      const { pdf } = await renderLabels({ template: 'kit', stock, title: 'Kit label', items: [kit] });
      const [page] = await decodePdf(pdf);
      expect(byFormat(page).map(({ format, text, raw, symbologyIdentifier }) => ({ format, text, raw, symbologyIdentifier }))).toEqual([
        // ]C1: Code 128 with FNC1 in the first position, i.e. GS1-128; the data in two symbols.
        { format: 'Code128', text: '(91)ACT-20-ENDCAP:B', raw: '91ACT-20-ENDCAP:B', symbologyIdentifier: ']C1' },
        { format: 'Code128', text: '(92)BO-2026-00042(93)50', raw: `92BO-2026-00042${GROUP_SEPARATOR}9350`, symbologyIdentifier: ']C1' },
        // ]d2: Data Matrix with FNC1 first, i.e. GS1 DataMatrix (ISO/IEC 16022 symbology identifiers).
        {
          format: 'DataMatrix',
          text: '(91)ACT-20-ENDCAP:B(92)BO-2026-00042(93)50',
          raw: `91ACT-20-ENDCAP:B${GROUP_SEPARATOR}92BO-2026-00042${GROUP_SEPARATOR}9350`,
          symbologyIdentifier: ']d2',
        },
      ]);
    });
  }

  it('a kit label with a GTIN decodes to (01) with its check digit, (30) and (10)', async () => {
    const { pdf } = await renderLabels({ template: 'kit', stock: '4x2in', title: 'Kit label', items: [{ ...kit, gtin: '6291041500213' }] });
    const [page] = await decodePdf(pdf);
    expect(page.find((d) => d.format === 'DataMatrix')?.raw).toBe(`010629104150021330${'50'}${GROUP_SEPARATOR}10BO-2026-00042`);
  });

  it('sizes pages to the stock, embeds subset TrueType fonts and draws no images', async () => {
    const { pdf } = await renderLabels({ template: 'bin', stock: '4x2in', title: 'Bin labels', items: bins });
    const doc = await PDFDocument.load(pdf);
    expect(doc.getPages().map((p) => [p.getWidth(), p.getHeight()])).toEqual([
      [288, 144],
      [288, 144],
    ]);
    const dicts = doc.context.enumerateIndirectObjects().flatMap(([, obj]) => (obj instanceof PDFDict ? [obj] : obj instanceof PDFRawStream ? [obj.dict] : []));
    const names = (key: string) => dicts.map((d) => d.get(PDFName.of(key))?.toString()).filter(Boolean);
    expect(new Set(names('BaseFont').map((n) => n!.replace(/-\d+$/, '')))).toEqual(new Set(['/ClearSans', '/JetBrainsMono-Regular', '/JetBrainsMono-Bold']));
    // TrueType outlines sit in FontFile2 streams (ISO 32000-1 §9.9); subset, each is a small part of its TTF.
    const fontFiles = dicts
      .map((d) => d.get(PDFName.of('FontFile2')))
      .filter(Boolean)
      .map((ref) => doc.context.lookup(ref as PDFRef) as PDFRawStream);
    expect(fontFiles).toHaveLength(3);
    for (const file of fontFiles) expect(file.getContentsSize()).toBeLessThan(statSync('fonts/JetBrainsMono-Regular.ttf').size / 4);
    expect(names('Subtype')).not.toContain('/Image');
  });

  it('sets a character the label fonts lack as "?" and names it, where it would otherwise print as nothing', async () => {
    const items = [{ ...bins[1], description: 'Ж-ring 漢字 🔩' }];
    const { pdf, unprintable } = await renderLabels({ template: 'bin', stock: '4x2in', title: 'Bin labels', items });
    expect(unprintable).toEqual(['漢', '字', '🔩']);
    // Read back by poppler's pdftotext, which knows nothing of our stand-in: Cyrillic is in the fonts, CJK and emoji are not.
    const dir = mkdtempSync(path.join(os.tmpdir(), 'tf-label-text-'));
    try {
      writeFileSync(path.join(dir, 'l.pdf'), pdf);
      expect(execFileSync('pdftotext', [path.join(dir, 'l.pdf'), '-']).toString()).toContain('Ж-ring ?? ?');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
    const plain = await renderLabels({ template: 'bin', stock: '4x2in', title: 'Bin labels', items: bins });
    expect(plain.unprintable).toEqual([]);
  });

  it('refuses a bin code too long for a Code 128 on the stock instead of shrinking it below 0.25 mm', async () => {
    await expect(
      renderLabels({
        template: 'part',
        stock: '2x1in',
        title: 'x',
        items: [{ partNumber: 'A-VERY-LONG-PART-NUMBER-THAT-WILL-NOT-FIT', description: '', partUrl: 'http://x/parts/1' }],
      }),
    ).rejects.toThrow(/too long/);
  });
});
