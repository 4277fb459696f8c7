import {
  FIND_KINDS,
  FIND_KIND_LABELS,
  FIND_SUB_KINDS,
  type EventView,
  type FindKind,
  type LakeView,
  type UnitPreferences,
} from '@shoalbook/shared';
import { Banner, Button, Checkbox, FormControl, Label, Select, Text } from '@primer/react';
import { useId, useState } from 'react';
import { OnPlaneCaution } from '../../../components/cautions/journal-cautions';
import { ErrorState } from '../../../components/feedback/query-states';
import type { GpxPreview, ImportResult } from '../../../lib/journal-types';
import type { UploadProgress } from '../../../lib/upload';
import { commitGpx, fileProblem, previewGpx, useAfterImport } from '../api/imports-api';
import { GpxPreviewTable, rowStatus } from './gpx-preview-table';
import { UploadProgressBar } from './upload-progress';
import styles from './imports.module.css';

/**
 * GPX 1.1 waypoints → finds, in two steps: the server reads the file and answers row by row (nothing
 * written), then the accepted rows go in together in one transaction.
 */
export function GpxImport({
  crewId,
  lakes,
  events,
  prefs,
  defaults = {},
}: {
  crewId: string;
  lakes: LakeView[];
  events: EventView[];
  prefs: UnitPreferences;
  defaults?: { lakeId?: string; eventId?: string };
}) {
  const [lakeId, setLakeId] = useState(defaults.lakeId ?? lakes[0]?.id ?? '');
  const [eventId, setEventId] = useState(defaults.eventId ?? '');
  const [kind, setKind] = useState<FindKind>('hard-bottom');
  const [subKind, setSubKind] = useState(FIND_SUB_KINDS['hard-bottom'][0]);
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [preview, setPreview] = useState<GpxPreview | null>(null);
  const [skipDuplicates, setSkipDuplicates] = useState(true);
  const [result, setResult] = useState<ImportResult | null>(null);
  const [failure, setFailure] = useState<unknown>(null);
  const afterImport = useAfterImport(crewId);
  const fileId = useId();
  const lake = lakes.find((l) => l.id === lakeId);
  const lakeEvents = events.filter((e) => e.lakeId === lakeId);
  const busy = progress !== null;

  const reset = () => {
    setPreview(null);
    setResult(null);
    setFailure(null);
  };

  const check = async () => {
    if (!file) {
      setProblem('Choose a GPX file first.');
      return;
    }
    const found = fileProblem(file, 'gpx');
    setProblem(found);
    if (found) return;
    reset();
    try {
      setPreview(await previewGpx(crewId, file, { lakeId, eventId: eventId || undefined }, setProgress));
    } catch (error) {
      setFailure(error);
    } finally {
      setProgress(null);
    }
  };

  const commit = async () => {
    if (!file || !preview) return;
    setFailure(null);
    try {
      const done = await commitGpx(
        crewId,
        file,
        { lakeId, eventId: eventId || undefined, kind, subKind, skipDuplicates },
        setProgress,
      );
      setResult(done);
      setPreview(null);
      await afterImport();
    } catch (error) {
      setFailure(error);
    } finally {
      setProgress(null);
    }
  };

  const counts = preview
    ? preview.rows.reduce((acc, row) => ({ ...acc, [rowStatus(row)]: acc[rowStatus(row)] + 1 }), {
        ready: 0,
        duplicate: 0,
        error: 0,
      })
    : null;
  const toImport = counts ? counts.ready + (skipDuplicates ? 0 : counts.duplicate) : 0;

  return (
    <div className={styles.panel}>
      <OnPlaneCaution />
      <div className={styles.grid}>
        <FormControl>
          <FormControl.Label>Lake</FormControl.Label>
          <Select
            value={lakeId}
            onChange={(e) => {
              setLakeId(e.target.value);
              setEventId('');
              reset();
            }}
            block
          >
            {lakes.map((l) => (
              <Select.Option key={l.id} value={l.id}>
                {l.name}
              </Select.Option>
            ))}
          </Select>
        </FormControl>
        <FormControl>
          <FormControl.Label>Event (optional)</FormControl.Label>
          <Select
            value={eventId}
            onChange={(e) => {
              setEventId(e.target.value);
              reset();
            }}
            block
          >
            <Select.Option value="">Not tied to an event</Select.Option>
            {lakeEvents.map((e) => (
              <Select.Option key={e.id} value={e.id}>
                {e.name}
              </Select.Option>
            ))}
          </Select>
        </FormControl>
        <FormControl>
          <FormControl.Label>Kind for the new finds</FormControl.Label>
          <Select
            value={kind}
            onChange={(e) => {
              const next = e.target.value as FindKind;
              setKind(next);
              setSubKind(FIND_SUB_KINDS[next][0]);
            }}
            block
          >
            {FIND_KINDS.map((k) => (
              <Select.Option key={k} value={k}>
                {FIND_KIND_LABELS[k]}
              </Select.Option>
            ))}
          </Select>
          <FormControl.Caption>
            For waypoints whose file names no kind of ours (a file exported from Shoalbook names each one).
          </FormControl.Caption>
        </FormControl>
        <FormControl>
          <FormControl.Label>Sub-kind</FormControl.Label>
          <Select value={subKind} onChange={(e) => setSubKind(e.target.value)} block>
            {FIND_SUB_KINDS[kind].map((s) => (
              <Select.Option key={s} value={s}>
                {s}
              </Select.Option>
            ))}
          </Select>
        </FormControl>
      </div>
      <div className={styles.file}>
        <label htmlFor={fileId} className={styles.fileLabel}>
          GPX file
        </label>
        <input
          id={fileId}
          type="file"
          accept=".gpx,application/gpx+xml"
          aria-describedby={`${fileId}-hint`}
          onChange={(e) => {
            setFile(e.target.files?.[0] ?? null);
            setProblem(null);
            reset();
          }}
        />
        <Text as="p" size="small" id={`${fileId}-hint`}>
          A GPX waypoint file from your unit or mapping app, up to 20 MB. Names, descriptions (kept as notes), times,
          positions and depths are read.
        </Text>
        {problem ? (
          <Text size="small" role="alert" className={styles.errorList}>
            {problem}
          </Text>
        ) : null}
      </div>
      <div className={styles.actions}>
        <Button onClick={check} disabled={busy} variant={preview ? 'default' : 'primary'}>
          Check the file
        </Button>
      </div>
      <UploadProgressBar progress={progress} what={file?.name ?? 'the file'} />
      {failure ? <ErrorState error={failure} title="The file could not be read" /> : null}
      {result ? (
        <Banner
          variant="success"
          title={`${result.imported} finds imported`}
          description={
            result.skipped
              ? `${result.skipped} waypoints were skipped (near an existing find or not readable).`
              : 'Every accepted waypoint is now a find.'
          }
        />
      ) : null}
      {preview && counts ? (
        <>
          <div className={styles.summary} aria-live="polite">
            <Label variant="success">{counts.ready} ready</Label>
            <Label variant="attention">{counts.duplicate} within 15 m of an existing find</Label>
            <Label variant="danger">{counts.error} cannot be imported</Label>
          </div>
          <GpxPreviewTable rows={preview.rows} prefs={prefs} timeZone={lake?.timeZone ?? 'UTC'} defaultKind={kind} />
          <FormControl>
            <Checkbox checked={skipDuplicates} onChange={(e) => setSkipDuplicates(e.target.checked)} />
            <FormControl.Label>Skip waypoints within 15 m of an existing find</FormControl.Label>
          </FormControl>
          <div className={styles.actions}>
            <Button variant="primary" onClick={commit} disabled={busy || toImport === 0}>
              {`Import ${toImport} finds`}
            </Button>
            <Text size="small">All of them go in together, or none if anything fails.</Text>
          </div>
        </>
      ) : null}
    </div>
  );
}
