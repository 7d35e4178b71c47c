import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, type PDFName, type PDFPage } from 'pdf-lib';
import { fitText } from './fit-text';
import { GlyphCache } from './glyph-cache';
import type { LabelFont, PreparedLabel } from './label-content';
import { fontBytes } from './label-fonts';
import { labelSlot, pageSize } from './sheet-layout';
import type { LabelStock } from './stocks';

export interface LabelPdfWriter {
  add(label: PreparedLabel): Promise<void>;
  finish(): Promise<LabelPdfFile>;
}

export interface LabelPdfFile {
  pdf: Uint8Array;
  /** Characters the label fonts have no glyph for, each printed as the stand-in, in first-seen order. */
  unprintable: string[];
}

// Writes prepared labels into one PDF as they come: a page per roll label, or a grid per sheet. Each page
// gets one content stream of raw operators: the symbols (made once, at encoding) and the text, set in
// the shipped TTFs, each embedded as a subset the first time a label uses it.
export async function createLabelsPdf({ stock, title }: { stock: LabelStock; title: string }): Promise<LabelPdfWriter> {
  const doc = await PDFDocument.create();
  doc.registerFontkit(fontkit);
  doc.setTitle(title);
  doc.setCreator('Tallyforge');
  doc.setProducer('Tallyforge labels (pdf-lib)');
  const fonts = new Map<LabelFont, GlyphCache>();
  const size = pageSize(stock);
  let page: PDFPage | undefined;
  let pageFonts = new Map<LabelFont, PDFName>();
  let pageNumber = -1;
  let index = 0;
  let ops = '';
  const flush = () => {
    if (page && ops) page.node.addContentStream(doc.context.register(doc.context.flateStream(ops)));
    ops = '';
  };
  const fontOnPage = async (name: LabelFont): Promise<{ cache: GlyphCache; key: PDFName }> => {
    let cache = fonts.get(name);
    if (!cache) fonts.set(name, (cache = new GlyphCache(await doc.embedFont(fontBytes(name), { subset: true }), fontkit.create(fontBytes(name)))));
    let key = pageFonts.get(name);
    if (!key) pageFonts.set(name, (key = page!.node.newFontDictionary(name, cache.font.ref)));
    return { cache, key };
  };
  return {
    async add(label) {
      const slot = labelSlot(stock, index++);
      if (slot.page !== pageNumber) {
        flush();
        page = doc.addPage([size.width, size.height]);
        pageFonts = new Map();
        pageNumber = slot.page;
      }
      if (label.symbolOps) ops += `q 1 0 0 1 ${slot.x} ${slot.y} cm\n${label.symbolOps}Q\n`;
      for (const run of label.texts) {
        const { cache, key } = await fontOnPage(run.font);
        const fitted = fitText(run.text, run, (text, at) => cache.width(text) * at);
        if (fitted.text) ops += `BT ${key} ${num(fitted.size)} Tf 1 0 0 1 ${num(slot.x + run.x)} ${num(slot.y + run.y)} Tm ${cache.hex(fitted.text)} Tj ET\n`;
      }
    },
    async finish() {
      flush();
      const unprintable = [...new Set([...fonts.values()].flatMap((cache) => [...cache.missing]))];
      return { pdf: await doc.save(), unprintable };
    },
  };
}

export async function assembleLabelsPdf({
  stock,
  labels,
  title,
}: {
  stock: LabelStock;
  labels: readonly PreparedLabel[];
  title: string;
}): Promise<LabelPdfFile> {
  const writer = await createLabelsPdf({ stock, title });
  for (const label of labels) await writer.add(label);
  return writer.finish();
}

function num(n: number): string {
  return String(Math.round(n * 1000) / 1000);
}
