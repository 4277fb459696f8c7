/**
 * Names the journal screens use for the API's answer shapes; all of them come from @shoalbook/shared
 * (the journal contract), so the front end and the back end cannot drift apart.
 */
export type {
  SkyContext,
  PracticeDayView,
  CompetitionDayView,
  OfficialWeighIn,
  RecordWeighInRequest,
  WeighInsView,
  WeighInDayView as WeighInDay,
  FindImportRow as GpxPreviewRow,
  FindImportPreview as GpxPreview,
  CatchImportRow as CsvPreviewRow,
  CatchImportPreview as CsvPreview,
  ImportRowError,
  FindView as FindWithSky,
  CatchView as CatchWithSky,
} from '@shoalbook/shared';

import type { ImportRowError } from '@shoalbook/shared';

/** What either import answers after committing (GPX imports also count the skipped rows). */
export interface ImportResult {
  imported: number;
  skipped?: number;
  errors: ImportRowError[];
}
