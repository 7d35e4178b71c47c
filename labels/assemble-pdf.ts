import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, type PDFFont, type PDFPage } from 'pdf-lib';
import { fitText } from './fit-text';
import type { LabelFont, PreparedLabel } from './label-content';
import { fontBytes, LABEL_FONTS } from './label-fonts';
import { labelSlot, pageSize } from './sheet-layout';
import type { LabelStock } from './stocks';

// Writes prepared labels into one PDF: a page per roll label, or a grid per sheet. Symbols go in as one
// extra content stream per page (their operators were made once, at encoding); text is set in the
// embedded, subset TTFs.
export async function assembleLabelsPdf({ stock, labels, title }: { stock: LabelStock; labels: readonly PreparedLabel[]; title: string }): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.registerFontkit(fontkit);
  doc.setTitle(title);
  doc.setCreator('Tallyforge');
  doc.setProducer('Tallyforge labels (pdf-lib)');
  const fonts = new Map<LabelFont, PDFFont>();
  for (const name of LABEL_FONTS) if (labels.some((l) => l.texts.some((t) => t.font === name))) fonts.set(name, await doc.embedFont(fontBytes(name), { subset: true }));

  const size = pageSize(stock);
  let page: PDFPage | undefined;
  let pageNumber = -1;
  let ops = '';
  const flush = () => {
    if (page && ops) page.node.addContentStream(doc.context.register(doc.context.flateStream(ops)));
    ops = '';
  };
  labels.forEach((label, index) => {
    const slot = labelSlot(stock, index);
    if (slot.page !== pageNumber) {
      flush();
      page = doc.addPage([size.width, size.height]);
      pageNumber = slot.page;
    }
    ops += `q 1 0 0 1 ${slot.x} ${slot.y} cm\n${label.symbolOps}Q\n`;
    for (const run of label.texts) {
      const font = fonts.get(run.font)!;
      const fitted = fitText(run.text, run, (text, at) => font.widthOfTextAtSize(text, at));
      if (fitted.text) page!.drawText(fitted.text, { x: slot.x + run.x, y: slot.y + run.y, size: fitted.size, font });
    }
  });
  flush();
  return doc.save();
}
