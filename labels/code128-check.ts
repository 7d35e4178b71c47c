// ISO/IEC 15417 Code 128 symbol check character: (start value + Σ position × symbol value) mod 103,
// positions counted from 1 after the start character. `values` begins with the start character's value.
// bwip-js computes this itself when it encodes; this states our understanding of the rule so it can be
// checked against the standard's worked example and against what the printed symbols decode to.
export function code128CheckValue(values: readonly number[]): number {
  if (!values.length) throw new RangeError('a Code 128 symbol starts with a start character');
  for (const v of values) if (!Number.isInteger(v) || v < 0 || v > 105) throw new RangeError(`not a Code 128 symbol value: ${v}`);
  let sum = values[0];
  for (let i = 1; i < values.length; i++) sum += i * values[i];
  return sum % 103;
}

// Symbol values of text in code set B (Start B = 104; ASCII 32–127 map to values 0–95).
export function code128SetBValues(text: string): number[] {
  const values = [104];
  for (const ch of text) {
    const code = ch.charCodeAt(0);
    if (code < 32 || code > 127) throw new RangeError(`code set B cannot carry ${JSON.stringify(ch)}`);
    values.push(code - 32);
  }
  return values;
}
