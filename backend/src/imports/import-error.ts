/** A whole-file problem (not a row's): the import is refused with this code and message. */
export class ImportFileError extends Error {
  constructor(
    readonly code:
      'file_too_large' | 'wrong_file_type' | 'malformed_file' | 'dtd_refused' | 'too_many_rows' | 'empty_file',
    message: string,
  ) {
    super(message);
  }
}
