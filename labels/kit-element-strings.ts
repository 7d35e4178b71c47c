import { toGtin14 } from './gs1-check-digit';
import { isCset82, type ElementString } from './gs1-element-strings';

export interface KitIdentity {
  kitCode: string;
  revision: string;
  orderNumber: string;
  quantity: number; // kits in the build order
  gtin?: string | null;
}

export class KitLabelDataError extends Error {}

// What a kit label carries, as GS1 element strings, split the way the GS1-128 prints them (two symbols,
// so each fits a 4 in label at a scannable X; GS1 lets a label carry several GS1-128 symbols).
//
// Without a GTIN, Tallyforge's own company-internal AIs (GS1 General Specifications: (91)–(99) are for
// company-internal use, X..90):
//   (91) kit code ":" revision   — ":" never occurs in a kit code, so the split is unambiguous
//   (92) build order number
//   (93) number of kits in the order
// With a GTIN for the kit, the standard AIs: (01) GTIN-14 with (30) count (GS1 pairing rules: (30)
// requires (01) or (02)), and (10) batch/lot = the build order number.
export function kitElementStrings(kit: KitIdentity): ElementString[][] {
  if (!Number.isInteger(kit.quantity) || kit.quantity < 1 || kit.quantity > 99_999_999)
    throw new KitLabelDataError('the kit count must be 1 to 99 999 999 (AI 30 is N..8)');
  for (const [name, value] of [
    ['kit code', kit.kitCode],
    ['revision', kit.revision],
    ['order number', kit.orderNumber],
  ] as const) {
    if (!value || !isCset82(value) || /[():]/.test(value)) throw new KitLabelDataError(`the ${name} has characters a GS1 label cannot carry`);
  }
  if (kit.gtin) {
    if (kit.orderNumber.length > 20) throw new KitLabelDataError('AI 10 holds at most 20 characters');
    return [
      [
        { ai: '01', value: toGtin14(kit.gtin) },
        { ai: '30', value: String(kit.quantity) },
      ],
      [{ ai: '10', value: kit.orderNumber }],
    ];
  }
  return [
    [{ ai: '91', value: `${kit.kitCode}:${kit.revision}` }],
    [
      { ai: '92', value: kit.orderNumber },
      { ai: '93', value: String(kit.quantity) },
    ],
  ];
}
