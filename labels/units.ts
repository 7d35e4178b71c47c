// PDF user space is 1/72 in. Label stocks are specified in inches (North American stock) or mm.
export const POINTS_PER_INCH = 72;

export function inches(value: number): number {
  return value * POINTS_PER_INCH;
}

export function millimetres(value: number): number {
  return (value / 25.4) * POINTS_PER_INCH;
}

export function toMillimetres(points: number): number {
  return (points / POINTS_PER_INCH) * 25.4;
}
