// Display formatting shared by server and client components. Times are shown in UTC so the
// server's render and the browser's hydration agree whatever the bench's time zone.
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

export function formatWhen(iso: string | null): string {
  return iso ? `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC` : '—';
}

export function todayIso(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}
