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
