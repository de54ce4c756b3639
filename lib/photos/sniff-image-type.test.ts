import { describe, expect, it } from 'vitest';
import { describeBytes, sniffImageType } from './sniff-image-type';

const bytes = (...parts: (number[] | string)[]) => new Uint8Array(parts.flatMap((p) => (typeof p === 'string' ? [...p].map((c) => c.charCodeAt(0)) : p)));

describe('sniffImageType', () => {
  it('recognises JPEG, PNG and WebP by their first bytes', () => {
    expect(sniffImageType(bytes([0xff, 0xd8, 0xff, 0xe0], 'JFIF'))).toBe('image/jpeg');
    expect(sniffImageType(bytes([0x89], 'PNG', [0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]))).toBe('image/png');
    expect(sniffImageType(bytes('RIFF', [1, 2, 3, 4], 'WEBPVP8 '))).toBe('image/webp');
  });

  it('refuses other formats whatever they claim to be', () => {
    expect(sniffImageType(bytes('GIF89a'))).toBeNull();
    expect(sniffImageType(bytes('%PDF-1.7'))).toBeNull();
    expect(sniffImageType(bytes('RIFF', [1, 2, 3, 4], 'WAVEfmt '))).toBeNull();
    expect(sniffImageType(bytes([0xff, 0xd8]))).toBeNull(); // too short to be a JPEG
    expect(sniffImageType(new Uint8Array())).toBeNull();
  });

  it('names what a refused file looks like', () => {
    expect(describeBytes(bytes('GIF89a'))).toBe('a GIF image');
    expect(describeBytes(bytes('%PDF-1.4'))).toBe('a PDF document');
    expect(describeBytes(new Uint8Array())).toBe('an empty file');
    expect(describeBytes(bytes('hello'))).toBe('a file of an unknown type');
  });
});
