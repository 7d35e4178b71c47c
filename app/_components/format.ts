// Number formatting shared by server and client components. Moments and days are written in the
// site's time zone by lib/time/site-clock (useSiteTime on the client).
const grams = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 6 });
const whole = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });
const fixed1 = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });

export function formatGrams(value: number | null | undefined): string {
  return value === null || value === undefined ? '—' : `${grams.format(value)} g`;
}

export function formatNumber(value: number): string {
  return whole.format(value);
}

export function formatPercent(share: number | null): string {
  return share === null ? '—' : `${fixed1.format(share * 100)} %`;
}
