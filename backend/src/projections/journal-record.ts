/** One journal_event row as the projector reads it. */
export interface JournalRecord {
  seq: number;
  crewId: string;
  type: string;
  aggregateType: string;
  aggregateId: string;
  payload: Record<string, unknown>;
}
