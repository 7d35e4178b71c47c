// A lone surrogate (half of a UTF-16 pair) is not a character: JSON can carry one as \uD800, but no
// UTF-8 column can store it (MariaDB writes "?"). Unicode 15, §3.9 D91: well-formed UTF-16.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export function isWellFormedText(text: string): boolean {
  return !LONE_SURROGATE.test(text);
}

// A path whose %XX escapes do not spell UTF-8 ("%E0%A4%A", "%FF") names nothing (RFC 3986 §2.1 with
// RFC 3629); decodeURIComponent throws a URIError on exactly those.
export function isWellFormedPath(path: string): boolean {
  try {
    decodeURIComponent(path);
    return true;
  } catch {
    return false;
  }
}
