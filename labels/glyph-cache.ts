import type { Font } from '@pdf-lib/fontkit';
import type { PDFFont } from 'pdf-lib';

// What a character the label font has no glyph for is printed as, so the gap shows on the label.
export const UNPRINTABLE_STAND_IN = '?';

// Text for labels, encoded a character at a time: each character's glyph is looked up (and added to the
// font subset) once per document, then strings are joined from cached pieces. Asking the font to lay out
// every string costs a millisecond or so each, which dominated large batches. Labels set short lines of
// codes and words, so per-character glyphs (no ligatures, no kerning) are what they should show anyway.
// A character the font lacks would print as nothing (its .notdef glyph): it is set as the stand-in
// instead, and remembered, so whoever asked for the labels can be told.
export class GlyphCache {
  private readonly glyphs = new Map<string, { hex: string; width: number }>();
  readonly missing = new Set<string>();

  constructor(
    readonly font: PDFFont,
    private readonly outlines: Font,
  ) {}

  private glyph(ch: string): { hex: string; width: number } {
    let g = this.glyphs.get(ch);
    if (!g) {
      const printable = this.outlines.hasGlyphForCodePoint(ch.codePointAt(0)!);
      if (!printable) this.missing.add(ch);
      const shown = printable ? ch : UNPRINTABLE_STAND_IN;
      const hex = this.font.encodeText(shown).toString();
      g = { hex: hex.slice(1, -1), width: this.font.widthOfTextAtSize(shown, 1) };
      this.glyphs.set(ch, g);
    }
    return g;
  }

  // Width of the text at 1 pt; multiply by the size.
  width(text: string): number {
    let w = 0;
    for (const ch of text) w += this.glyph(ch).width;
    return w;
  }

  // The text as a PDF hex string of glyph ids, for Tj.
  hex(text: string): string {
    let h = '<';
    for (const ch of text) h += this.glyph(ch).hex;
    return `${h}>`;
  }
}
