// A lone surrogate (half of a UTF-16 pair) is not a character: JSON can carry one as \uD800, but no
// UTF-8 column can store it (MariaDB writes "?"). Unicode 15, §3.9 D91: well-formed UTF-16.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export function isWellFormedText(text: string): boolean {
  return !LONE_SURROGATE.test(text);
}
