import bwipjs from 'bwip-js/node';
import { vectorDrawing } from './vector-drawing';

export type Symbology = 'code128' | 'qrcode' | 'gs1-128' | 'gs1datamatrix';

export interface SymbolRequest {
  symbology: Symbology;
  // Plain data for Code 128 and QR; GS1 element strings with AIs in parentheses for the GS1 symbols.
  data: string;
}

export interface EncodedSymbol extends SymbolRequest {
  modulesWide: number;
  modulesHigh: number; // 1 for linear symbols: their height is chosen by the label
  pixelsPerModule: number;
  width: number; // pixels
  height: number;
  ops: string;
}

// At scale 1 bwip-js draws one pixel per module for linear symbols and two for matrix symbols.
const PIXELS_PER_MODULE: Record<Symbology, number> = { code128: 1, 'gs1-128': 1, qrcode: 2, gs1datamatrix: 2 };
const LINEAR = new Set<Symbology>(['code128', 'gs1-128']);

// QR error correction M recovers about 15 % of the symbol (ISO/IEC 18004, from memory): enough for a
// scuffed bin front, and keeps a part URL in a small version.
const OPTIONS: Record<Symbology, Record<string, unknown>> = {
  code128: {},
  'gs1-128': {},
  qrcode: { eclevel: 'M' },
  gs1datamatrix: {},
};

export function encodeSymbol({ symbology, data }: SymbolRequest): EncodedSymbol {
  const drawn = bwipjs.render({ bcid: symbology, text: data, scale: 1, ...OPTIONS[symbology] }, vectorDrawing());
  const ppm = PIXELS_PER_MODULE[symbology];
  const modulesWide = drawn.width / ppm;
  const modulesHigh = LINEAR.has(symbology) ? 1 : drawn.height / ppm;
  if (!Number.isInteger(modulesWide) || !Number.isInteger(modulesHigh)) throw new Error(`${symbology} did not land on whole modules`);
  return { symbology, data, modulesWide, modulesHigh, pixelsPerModule: ppm, width: drawn.width, height: drawn.height, ops: drawn.ops };
}

// The operators that draw the symbol with its top-left corner at (left, top) in label points (y up),
// modules `moduleSize` points wide and, for linear symbols, bars `barHeight` points tall.
export function placeSymbol(symbol: EncodedSymbol, { left, top, moduleSize, barHeight }: { left: number; top: number; moduleSize: number; barHeight?: number }): string {
  const sx = moduleSize / symbol.pixelsPerModule;
  const sy = symbol.modulesHigh === 1 ? (barHeight ?? 0) / symbol.height : sx;
  if (!(sy > 0)) throw new Error('a linear symbol needs a bar height');
  return `q ${num(sx)} 0 0 ${num(-sy)} ${num(left)} ${num(top)} cm\n${symbol.ops}Q\n`;
}

function num(n: number): string {
  return String(Math.round(n * 10000) / 10000);
}
