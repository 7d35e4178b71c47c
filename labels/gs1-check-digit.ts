// GS1 General Specifications §7.9.1: the standard check digit of GTIN-8/12/13/14 and SSCC.
// Weights 3, 1, 3, … from the rightmost data digit; the check digit brings the sum up to a multiple of ten.
export function gs1CheckDigit(data: string): number {
  if (!/^\d{1,17}$/.test(data)) throw new RangeError('GS1 check digits are computed over 1–17 digits');
  let sum = 0;
  for (let i = 0; i < data.length; i++) {
    const digit = data.charCodeAt(data.length - 1 - i) - 48;
    sum += digit * (i % 2 === 0 ? 3 : 1);
  }
  return (10 - (sum % 10)) % 10;
}

// A GTIN-8, -12, -13 or -14 whose last digit is its check digit.
export function isValidGtin(gtin: string): boolean {
  if (!/^(\d{8}|\d{12,14})$/.test(gtin)) return false;
  return gs1CheckDigit(gtin.slice(0, -1)) === Number(gtin.at(-1));
}

// Any GTIN as the 14 digits AI (01) carries, padded with leading zeros (GS1 General Specifications §3.3.2, from memory).
export function toGtin14(gtin: string): string {
  if (!isValidGtin(gtin)) throw new RangeError(`${gtin} is not a GTIN with a valid check digit`);
  return gtin.padStart(14, '0');
}
