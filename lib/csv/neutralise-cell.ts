// A spreadsheet runs a cell that starts with = + - @ tab or CR as a formula. Prefixing a single
// quote makes it plain text (OWASP, "CSV Injection").
const FORMULA_START = /^[=+\-@\t\r]/;

export function neutraliseCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  const text = String(value);
  return FORMULA_START.test(text) ? `'${text}` : text;
}
