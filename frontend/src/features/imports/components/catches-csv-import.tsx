import type { EventView, LakeView, UnitPreferences } from '@shoalbook/shared';
import { DownloadIcon } from '@primer/octicons-react';
import { Banner, Button, FormControl, Label, LinkButton, Select, Text } from '@primer/react';
import { useId, useState } from 'react';
import { FishCareCaution } from '../../../components/cautions/journal-cautions';
import { ErrorState } from '../../../components/feedback/query-states';
import type { CsvPreview, CsvPreviewRow, ImportResult } from '../../../lib/journal-types';
import type { UploadProgress } from '../../../lib/upload';
import {
  catchesTemplateUrl,
  commitCatchesCsv,
  fileProblem,
  previewCatchesCsv,
  useAfterImport,
} from '../api/imports-api';
import { CsvPreviewTable } from './csv-preview-table';
import { UploadProgressBar } from './upload-progress';
import styles from './imports.module.css';

/** The messages of one preview row, each with the column it concerns. */
export function rowErrors(row: CsvPreviewRow): string[] {
  return row.errors.map((e) => (e.field ? `${e.field}: ${e.message}` : e.message));
}

/** Catches from a spreadsheet: download the template, fill it in, check it row by row, then import it in one go. */
export function CatchesCsvImport({
  crewId,
  events,
  lakes,
  prefs,
  defaultEventId,
}: {
  crewId: string;
  events: EventView[];
  /** For the lake's clock: times in the preview are shown as the file gave them, in lake time. */
  lakes: LakeView[];
  prefs: UnitPreferences;
  defaultEventId?: string;
}) {
  const [eventId, setEventId] = useState(defaultEventId ?? events[0]?.id ?? '');
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [preview, setPreview] = useState<CsvPreview | null>(null);
  const [result, setResult] = useState<ImportResult | null>(null);
  const [failure, setFailure] = useState<unknown>(null);
  const afterImport = useAfterImport(crewId);
  const fileId = useId();
  const timeZone = lakes.find((l) => l.id === events.find((e) => e.id === eventId)?.lakeId)?.timeZone ?? 'UTC';

  const check = async () => {
    if (!file) return setProblem('Choose a CSV file first.');
    const found = fileProblem(file, 'csv');
    setProblem(found);
    if (found) return;
    setPreview(null);
    setResult(null);
    setFailure(null);
    try {
      setPreview(await previewCatchesCsv(crewId, file, eventId, setProgress));
    } catch (error) {
      setFailure(error);
    } finally {
      setProgress(null);
    }
  };

  const commit = async () => {
    if (!file) return;
    setFailure(null);
    try {
      setResult(await commitCatchesCsv(crewId, file, eventId, setProgress));
      setPreview(null);
      await afterImport();
    } catch (error) {
      setFailure(error);
    } finally {
      setProgress(null);
    }
  };

  if (events.length === 0) {
    return (
      <Text as="p">Add an event with its competition days first; imported catches belong to one of its days.</Text>
    );
  }
  return (
    <div className={styles.panel}>
      <FishCareCaution />
      <div className={styles.grid}>
        <FormControl>
          <FormControl.Label>Event</FormControl.Label>
          <Select value={eventId} onChange={(e) => setEventId(e.target.value)} block>
            {events.map((e) => (
              <Select.Option key={e.id} value={e.id}>
                {e.name}
              </Select.Option>
            ))}
          </Select>
        </FormControl>
        <div>
          <LinkButton
            href={catchesTemplateUrl(crewId)}
            download="shoalbook-catches-template.csv"
            leadingVisual={DownloadIcon}
          >
            Download the CSV template
          </LinkButton>
        </div>
      </div>
      <div className={styles.file}>
        <label htmlFor={fileId} className={styles.fileLabel}>
          CSV file of catches
        </label>
        <input
          id={fileId}
          type="file"
          accept=".csv,text/csv"
          onChange={(e) => {
            setFile(e.target.files?.[0] ?? null);
            setProblem(null);
            setPreview(null);
          }}
        />
        {problem ? (
          <Text size="small" role="alert" className={styles.errorList}>
            {problem}
          </Text>
        ) : null}
      </div>
      <div className={styles.actions}>
        <Button onClick={check} disabled={progress !== null}>
          Check the file
        </Button>
      </div>
      <UploadProgressBar progress={progress} what={file?.name ?? 'the file'} />
      {failure ? <ErrorState error={failure} title="The file could not be read" /> : null}
      {result ? (
        <Banner
          variant="success"
          title={`${result.imported} catches imported`}
          description={
            result.skipped
              ? `${result.skipped} rows were already logged (same day, minute, species and weight) and were skipped.`
              : 'Every row is in, in one go.'
          }
        />
      ) : null}
      {preview ? (
        <>
          <div className={styles.summary} aria-live="polite">
            <Label variant="success">{preview.accepted} rows ready</Label>
            <Label variant="attention">{preview.duplicates} already logged</Label>
            <Label variant="danger">{preview.rejected} rows with errors</Label>
          </div>
          <CsvPreviewTable rows={preview.rows} prefs={prefs} timeZone={timeZone} />
          {preview.rejected > 0 ? (
            <section aria-label="What to fix, line by line" className={styles.fixList}>
              <Text as="p" weight="semibold">
                What to fix, line by line
              </Text>
              <ul>
                {preview.rows
                  .filter((row) => row.errors.length)
                  .map((row) => (
                    <li key={row.index}>
                      Line {row.line}: {rowErrors(row).join('; ')}
                    </li>
                  ))}
              </ul>
            </section>
          ) : null}
          <div className={styles.actions}>
            <Button
              variant="primary"
              onClick={commit}
              disabled={progress !== null || preview.accepted - preview.duplicates === 0 || preview.rejected > 0}
            >
              {`Import ${preview.accepted - preview.duplicates} catches`}
            </Button>
            <Text size="small">
              {preview.rejected > 0
                ? 'Fix the rows above and check again; nothing is imported while a row is wrong.'
                : preview.duplicates
                  ? 'All new rows go in together; the ones already logged are skipped.'
                  : 'All rows go in together.'}
            </Text>
          </div>
        </>
      ) : null}
    </div>
  );
}
