import type { DrawingContext } from 'bwip-js/node';

// A bwip-js drawing context that writes the symbol straight into PDF path operators, so each symbol is
// encoded once and never passes through SVG text. Coordinates stay in bwip-js pixels (y down), whole
// numbers at scale 1; the label places the symbol with one `cm` that maps pixels to points.
export interface VectorSymbol {
  width: number; // pixels
  height: number;
  ops: string; // PDF content-stream operators: rectangles filled with f, outlines with f*
}

export function vectorDrawing(): DrawingContext<VectorSymbol> {
  let width = 0;
  let height = 0;
  let bars = '';
  let outline = '';
  let filled = '';
  return {
    scale: () => null,
    measure: () => {
      throw new Error('symbol text is set by the label in its own fonts; do not ask bwip-js for it');
    },
    init(w, h) {
      width = w;
      height = h;
    },
    // Linear symbols: one stroked line per bar. bwip-js puts the bigger half of the pen width left of
    // (or above) the line, and the line's end pixels inside the bar.
    line(x0, y0, x1, y1, lw) {
      const half = Math.ceil(lw / 2);
      if (x0 === x1) bars += `${x0 - half} ${Math.min(y0, y1)} ${lw} ${Math.abs(y1 - y0) + 1} re\n`;
      else if (y0 === y1) bars += `${Math.min(x0, x1)} ${y0 - half} ${Math.abs(x1 - x0) + 1} ${lw} re\n`;
      else throw new Error('bwip-js drew a slanted line; only orthogonal bars are expected');
    },
    // Matrix symbols: outlines of connected dark regions, with holes, filled even-odd.
    polygon(pts) {
      outline += `${pts[0][0]} ${pts[0][1]} m`;
      for (let i = 1; i < pts.length; i++) outline += ` ${pts[i][0]} ${pts[i][1]} l`;
      outline += ' h\n';
    },
    hexagon() {
      throw new Error('hexagons (MaxiCode) are not used on Tallyforge labels');
    },
    ellipse() {
      throw new Error('ellipses (DotCode, MaxiCode) are not used on Tallyforge labels');
    },
    fill() {
      if (outline) filled += `${outline}f*\n`;
      outline = '';
    },
    text() {
      throw new Error('symbol text is set by the label in its own fonts; do not ask bwip-js for it');
    },
    end() {
      return { width, height, ops: (bars ? `${bars}f\n` : '') + filled };
    },
  };
}
