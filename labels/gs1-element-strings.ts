// GS1 element strings: an Application Identifier and its data (GS1 General Specifications §3).
export interface ElementString {
  ai: string;
  value: string;
}

// AIs whose length is predefined by their first two digits and so never need a separator after them:
// 00–04, 11–20, 31–36, 41 (GS1 General Specifications, table of predefined-length element strings;
// as listed in docs/references.md).
const PREDEFINED_LENGTH = /^(0[0-4]|1[1-9]|20|3[1-6]|41)/;
export const GROUP_SEPARATOR = '\x1d';

// GS1 AI encodable character set 82 (GS1 General Specifications, section on AI character sets; from memory).
const CSET_82 = /^[!"%&'()*+,\-./0-9:;<=>?A-Z_a-z]*$/;

export function isCset82(text: string): boolean {
  return CSET_82.test(text);
}

// The bracketed form bwip-js reads and people see under a GS1-128: (91)…(92)…
export function bracketed(elements: readonly ElementString[]): string {
  return elements.map((e) => `(${e.ai})${e.value}`).join('');
}

// What a scanner transmits after the symbology identifier: FNC1 ends every element whose length is not
// predefined, unless it is the last, and is sent as GS (ASCII 29).
export function transmitted(elements: readonly ElementString[]): string {
  return elements.map((e, i) => e.ai + e.value + (i < elements.length - 1 && !PREDEFINED_LENGTH.test(e.ai) ? GROUP_SEPARATOR : '')).join('');
}
