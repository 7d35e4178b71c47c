// Characters a label could not print (the label fonts lack them), as told to the person who asked for
// the labels: in a response header as code points (headers are ASCII), and in words on the page and log.
export const UNPRINTABLE_HEADER = 'X-Unprintable-Characters';

const codePoint = (ch: string) => `U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;

/** "U+6F22 U+5B57": the notation of the Unicode Standard (§ Notational Conventions). */
export function toCodePointList(chars: readonly string[]): string {
  return chars.map(codePoint).join(' ');
}

export function fromCodePointList(list: string | null): string[] {
  return (list ?? '')
    .split(' ')
    .filter((t) => /^U\+[0-9A-F]{4,6}$/.test(t))
    .map((t) => String.fromCodePoint(parseInt(t.slice(2), 16)));
}

export function describeUnprintable(chars: readonly string[]): string {
  const named = chars.map((ch) => `${ch} (${codePoint(ch)})`).join(', ');
  return `Printed as "?": ${named}. The label fonts have no such character; spell it another way if the label must show it.`;
}
