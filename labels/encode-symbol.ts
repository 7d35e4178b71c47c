import bwipjs from 'bwip-js/node';

export type Symbology = 'code128' | 'qrcode' | 'gs1-128' | 'gs1datamatrix';

export interface SymbolRequest {
  symbology: Symbology;
  // Plain data for Code 128 and QR; GS1 element strings with AIs in parentheses for the GS1 symbols.
  data: string;
}

export interface EncodedSymbol extends SymbolRequest {
  modulesWide: number;
  modulesHigh: number; // 1 for linear symbols: their bar height is chosen by the label
  // PDF path operators in module units, y down from the top-left corner: filled rectangles.
  ops: string;
}

type Raw = Array<{ sbs?: number[]; bbs?: number[]; bhs?: number[]; pixs?: number[]; pixx?: number; pixy?: number }>;

// QR error correction M recovers about 15 % of the symbol (ISO/IEC 18004, from memory): enough for a
// scuffed bin front, and keeps a part URL in a small version.
const OPTIONS: Record<Symbology, string> = { code128: '', 'gs1-128': '', qrcode: 'eclevel=M', gs1datamatrix: '' };

// bwip-js encodes (check characters, FNC1, GS1 syntax and pairing rules are all its work); its raw
// output — bar and space widths, or the module matrix — is turned into rectangles here, once. Its own
// drawing (toSVG or the drawing API) costs 1.5 to 10 times the encoding itself (see scripts/bench-labels.ts).
export function encodeSymbol({ symbology, data }: SymbolRequest): EncodedSymbol {
  const [raw] = bwipjs.raw(symbology, data, OPTIONS[symbology]) as Raw;
  if (raw.sbs) {
    // Bar heights (bhs) come in bwip-js's default height; all equal and all from the baseline is a plain linear symbol.
    if (raw.bhs?.some((h) => h !== raw.bhs![0]) || raw.bbs?.some((b) => b !== 0))
      throw new Error(`${symbology} has bars of uneven height; not a plain linear symbol`);
    return { symbology, data, ...linearOps(raw.sbs) };
  }
  if (raw.pixs && raw.pixx && raw.pixy) return { symbology, data, ...matrixOps(raw.pixs, raw.pixx, raw.pixy) };
  throw new Error(`bwip-js gave no modules for ${symbology}`);
}

// Widths alternate bar, space, bar, … in modules, starting with a bar.
function linearOps(sbs: number[]): { modulesWide: number; modulesHigh: number; ops: string } {
  let x = 0;
  let ops = '';
  sbs.forEach((w, i) => {
    if (i % 2 === 0) ops += `${x} 0 ${w} 1 re\n`;
    x += w;
  });
  return { modulesWide: x, modulesHigh: 1, ops: `${ops}f\n` };
}

// Row by row, top down; each run of dark modules in a row becomes one rectangle.
function matrixOps(pixs: number[], width: number, height: number): { modulesWide: number; modulesHigh: number; ops: string } {
  let ops = '';
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      if (!pixs[y * width + x]) continue;
      let end = x;
      while (end + 1 < width && pixs[y * width + end + 1]) end++;
      ops += `${x} ${y} ${end - x + 1} 1 re\n`;
      x = end;
    }
  }
  return { modulesWide: width, modulesHigh: height, ops: `${ops}f\n` };
}

// The operators that draw the symbol with its top-left corner at (left, top) in label points (y up),
// modules `moduleSize` points wide and, for linear symbols, bars `barHeight` points tall.
export function placeSymbol(
  symbol: EncodedSymbol,
  { left, top, moduleSize, barHeight }: { left: number; top: number; moduleSize: number; barHeight?: number },
): string {
  const sy = symbol.modulesHigh === 1 ? (barHeight ?? 0) : moduleSize;
  if (!(sy > 0)) throw new Error('a linear symbol needs a bar height');
  return `q ${num(moduleSize)} 0 0 ${num(-sy)} ${num(left)} ${num(top)} cm\n${symbol.ops}Q\n`;
}

function num(n: number): string {
  return String(Math.round(n * 10000) / 10000);
}
