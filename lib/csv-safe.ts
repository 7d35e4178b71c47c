/**
 * Neutralises spreadsheet formula injection in exported text: a cell that starts with
 * = + - @ or a tab or carriage return gets a leading apostrophe (OWASP, "CSV Injection").
 * Numbers stay numbers; only text is touched.
 */
export function safeCell(value: unknown): string | number {
  if (typeof value === 'number') return Number.isFinite(value) ? value : '';
  if (value === null || value === undefined) return '';
  const text = String(value);
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}
