import type { CatchView, FindView } from '@shoalbook/shared';

/**
 * Answer shapes of the journal routes that the shared package does not (yet) spell out, written from the
 * agreed journal contract. Where @shoalbook/shared gains the same type, use that one instead.
 */

/** Sun and moon context of an instant (ISO-8601 UTC instants; phase 0 new … 0.5 full; illumination 0–1). */
export interface SkyContext {
  sunrise: string | null;
  sunset: string | null;
  moonrise: string | null;
  moonset: string | null;
  moonPhase: number;
  moonIllumination: number;
  period: { kind: 'major' | 'minor'; start: string; end: string } | null;
}

export type FindWithSky = FindView & { sky?: SkyContext | null };
export type CatchWithSky = CatchView & { sky?: SkyContext | null; competitionDayId?: string };

export interface PracticeDayView {
  id: string;
  eventId: string;
  date: string;
  notes: string;
  waterTempF: number | null;
}

export interface CompetitionDayView {
  id: string;
  eventId: string;
  date: string;
  startTime: string | null;
  checkInTime: string | null;
  weatherNotes: string;
  waterTempF: number | null;
}

export interface OfficialWeighIn {
  grossLb: number | null;
  penaltyLb: number | null;
  officialLb: number | null;
  dayPlace: number | null;
  lateMinutes: number | null;
}

export interface WeighInDay {
  competitionDayId: string;
  date: string;
  computed: { counted: string[]; culled: string[]; grossLb: number; penaltyLb: number; netLb: number };
  official: OfficialWeighIn | null;
  catches: CatchWithSky[];
}

export interface WeighInsView {
  days: WeighInDay[];
  totals: { computedNetLb: number; officialLb: number | null; finalPlace: number | null };
}

export interface GpxPreviewRow {
  index: number;
  name: string;
  lat: number | null;
  lon: number | null;
  markedAt: string | null;
  depthFt: number | null;
  error: string | null;
  duplicateOf: { findId: string; name: string; distanceM: number } | null;
}

export interface GpxPreview {
  rows: GpxPreviewRow[];
  accepted: number;
  rejected: number;
}

export interface ImportResult {
  imported: number;
  skipped: number;
  errors: Array<{ index?: number; row?: number; message?: string; error?: string } | string>;
}

export interface CsvPreviewRow {
  /** 1-based row of the file (header is row 1) or 0-based index, as the server numbers them. */
  index?: number;
  row?: number;
  values?: Record<string, string>;
  error?: string | null;
  errors?: string[] | Record<string, string[]> | null;
}

export interface CsvPreview {
  rows: CsvPreviewRow[];
  accepted: number;
  rejected: number;
}
