import { describe, expect, it } from 'vitest';
import { ImportFileError } from './import-error';
import { assertTextFile } from './sniff';

const GPX =
  '<?xml version="1.0" encoding="UTF-16"?><gpx version="1.1"><wpt lat="1" lon="2"><name>Ledge é</name></wpt></gpx>';

/** UTF-16 with its byte-order mark (Unicode 15 §23.8: FF FE little-endian, FE FF big-endian). */
function utf16(text: string, endian: 'le' | 'be'): Buffer {
  const le = Buffer.from(text, 'utf16le');
  if (endian === 'le') return Buffer.concat([Buffer.from([0xff, 0xfe]), le]);
  return Buffer.concat([Buffer.from([0xfe, 0xff]), le.swap16()]);
}

async function codeOf(p: Promise<unknown>): Promise<string> {
  const e = await p.then(
    () => null,
    (x: unknown) => x,
  );
  return e instanceof ImportFileError ? e.code : String(e);
}

describe('assertTextFile', () => {
  it('decodes UTF-16 text of either byte order instead of taking it for binary', async () => {
    await expect(assertTextFile(utf16(GPX, 'le'), 'a GPX file')).resolves.toBe(GPX);
    await expect(assertTextFile(utf16(GPX, 'be'), 'a GPX file')).resolves.toBe(GPX);
  });

  it('keeps refusing binary files and UTF-16 that does not decode', async () => {
    const png = Buffer.from('89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c489', 'hex');
    expect(await codeOf(assertTextFile(png, 'a GPX file'))).toBe('wrong_file_type');
    // A lone high surrogate (D800) is not UTF-16 text.
    expect(await codeOf(assertTextFile(Buffer.from([0xff, 0xfe, 0x00, 0xd8, 0x41, 0x00]), 'a GPX file'))).toBe(
      'wrong_file_type',
    );
    expect(await codeOf(assertTextFile(Buffer.from('a\u0000b'), 'a GPX file'))).toBe('wrong_file_type');
  });
});
