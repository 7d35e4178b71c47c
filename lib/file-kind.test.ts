import { describe, expect, it } from 'vitest';
import { detectFileKind } from './file-kind';

const bytes = (...parts: Array<number[] | string>) => new Uint8Array(parts.flatMap((p) => (typeof p === 'string' ? [...p].map((c) => c.charCodeAt(0)) : p)));

describe('recognising uploads by their first bytes', () => {
  it('knows JPEG, PNG, WebP and PDF', () => {
    expect(detectFileKind(bytes([0xff, 0xd8, 0xff, 0xe0]))).toBe('jpeg');
    expect(detectFileKind(bytes([0x89], 'PNG', [0x0d, 0x0a, 0x1a, 0x0a, 0]))).toBe('png');
    expect(detectFileKind(bytes('RIFF', [1, 2, 3, 4], 'WEBPVP8 '))).toBe('webp');
    expect(detectFileKind(bytes('%PDF-1.7\n'))).toBe('pdf');
  });

  it('refuses anything else, such as an HTML page named photo.jpg', () => {
    expect(detectFileKind(bytes('<html><script>'))).toBeNull();
    expect(detectFileKind(bytes('RIFF', [0, 0, 0, 0], 'WAVE'))).toBeNull();
    expect(detectFileKind(new Uint8Array())).toBeNull();
  });
});
