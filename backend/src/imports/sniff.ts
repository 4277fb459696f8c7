import * as FileType from 'file-type';
import { ImportFileError } from './import-error';

/**
 * The type the bytes announce (magic numbers), or undefined when they announce none. file-type throws
 * End-Of-Stream on a signature cut short (an 8-byte PNG header, say); such a file has no usable type either.
 */
export async function sniffType(buffer: Buffer): Promise<FileType.FileTypeResult | undefined> {
  try {
    return await FileType.fromBuffer(buffer);
  } catch {
    return undefined;
  }
}

/**
 * Refuse a binary file posing as text (a PNG renamed .gpx, a zip, …): the type is decided by the
 * bytes, never by the name or the client's content-type header.
 */
export async function assertTextFile(buffer: Buffer, expected: string): Promise<string> {
  if (buffer.length === 0) throw new ImportFileError('empty_file', 'The file is empty.');
  const utf16 = utf16Text(buffer, expected);
  if (utf16 !== null) return utf16;
  const detected = await sniffType(buffer);
  if (detected && detected.ext !== 'xml') {
    throw new ImportFileError(
      'wrong_file_type',
      `The file's content is ${detected.mime} (${detected.ext}), not ${expected}.`,
    );
  }
  if (buffer.includes(0)) throw new ImportFileError('wrong_file_type', `The file is binary, not ${expected}.`);
  const text = buffer.toString('utf8');
  if (text.includes('\uFFFD'))
    throw new ImportFileError('wrong_file_type', `The file is not UTF-8 text, so it cannot be ${expected}.`);
  return text.replace(/^\uFEFF/, '');
}

/**
 * Text that announces itself as UTF-16 with a byte-order mark (Unicode 15, §23.8: FF FE little-endian,
 * FE FF big-endian) is decoded as such, before any sniffing: its zero bytes would otherwise read as binary.
 */
function utf16Text(buffer: Buffer, expected: string): string | null {
  const encoding =
    buffer[0] === 0xff && buffer[1] === 0xfe
      ? 'utf-16le'
      : buffer[0] === 0xfe && buffer[1] === 0xff
        ? 'utf-16be'
        : null;
  if (!encoding) return null;
  try {
    const text = new TextDecoder(encoding, { fatal: true }).decode(buffer.subarray(2));
    if (text.includes('\u0000')) throw new Error('NUL');
    return text;
  } catch {
    throw new ImportFileError(
      'wrong_file_type',
      `The file starts like UTF-16 text but is not, so it cannot be ${expected}.`,
    );
  }
}
