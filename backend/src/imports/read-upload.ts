import { HttpStatus } from '@nestjs/common';
import { ApiException } from '../common/errors/api-errors';
import { parseGpx, type GpxWaypoint } from './gpx-parser';
import { ImportFileError } from './import-error';
import { assertTextFile } from './sniff';
import { parseCatchCsv, type ParsedCsv } from './catch-csv';

/** Whole-file problems become one 400 (413 for size) with a stable code; nothing has been written. */
export function toApiException(e: ImportFileError): ApiException {
  const status = e.code === 'file_too_large' ? HttpStatus.PAYLOAD_TOO_LARGE : HttpStatus.BAD_REQUEST;
  return new ApiException(status, e.message, e.code, { file: [e.message] });
}

export async function readGpxUpload(file: Buffer): Promise<GpxWaypoint[]> {
  try {
    return parseGpx(await assertTextFile(file, 'a GPX file'));
  } catch (e) {
    if (e instanceof ImportFileError) throw toApiException(e);
    throw e;
  }
}

export async function readCatchCsvUpload(file: Buffer): Promise<ParsedCsv> {
  try {
    return parseCatchCsv(await assertTextFile(file, 'a CSV file'));
  } catch (e) {
    if (e instanceof ImportFileError) throw toApiException(e);
    throw e;
  }
}
