// What a label template produces for one label, ready to be written into a PDF: symbols already turned
// into PDF operators and text runs still as text, fitted to their boxes when the fonts are at hand.
// Plain data (strings and numbers), so it can be prepared in a worker thread and sent back.
export type LabelFont = 'sans' | 'sansBold' | 'mono' | 'monoBold';

export interface TextRun {
  text: string;
  font: LabelFont;
  size: number; // points, the largest size to use
  x: number; // left end of the baseline, label points
  y: number;
  maxWidth: number;
  // Codes shrink until they fit and are never cut short; free text may end in an ellipsis.
  overflow: 'shrink' | 'ellipsis';
}

export interface PreparedLabel {
  symbolOps: string; // label-relative PDF operators
  texts: TextRun[];
}

export class LabelFitError extends Error {}
