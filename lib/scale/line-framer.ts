/**
 * CR/LF framing for a byte stream that arrives in arbitrary chunks: a line may be
 * split anywhere, CR LF may straddle two chunks. Empty lines are skipped; overlong
 * lines and lines with control characters are dropped and counted as malformed.
 */
import { MAX_LINE_LENGTH } from './parse-line';

export class LineFramer {
  private buffer = '';
  private overflow = false;
  private dropped = 0;

  constructor(private readonly maxLength: number = MAX_LINE_LENGTH) {}

  /** Lines dropped so far (too long, or holding control characters). */
  get malformed(): number {
    return this.dropped;
  }

  push(chunk: string): string[] {
    const lines: string[] = [];
    for (const ch of chunk) {
      if (ch === '\r' || ch === '\n') {
        this.endLine(lines);
      } else if (!this.overflow) {
        this.buffer += ch;
        if (this.buffer.length > this.maxLength) {
          // Keep nothing of a runaway line; memory stays bounded on a noisy port.
          this.overflow = true;
          this.buffer = '';
        }
      }
    }
    return lines;
  }

  /** The unterminated rest at the end of a stream, if any. */
  flush(): string[] {
    const lines: string[] = [];
    this.endLine(lines);
    return lines;
  }

  private endLine(lines: string[]): void {
    const line = this.buffer;
    this.buffer = '';
    if (this.overflow) {
      this.overflow = false;
      this.dropped += 1;
      return;
    }
    if (line.length === 0) return;
    // Tab is allowed as white space; other C0 controls and DEL mean line noise.
    if (/[\u0000-\u0008\u000a-\u001f\u007f]/.test(line)) {
      this.dropped += 1;
      return;
    }
    lines.push(line);
  }
}
