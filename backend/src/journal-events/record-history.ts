/**
 * A record's history from its journal events: each event carries the record's full state (see
 * record-state.ts), so comparing each state with the one before tells which figures changed, when and
 * by whom. Events without a figure (a deletion's `{ id }`) change nothing.
 */
export interface JournalStep {
  payload: Record<string, unknown>;
  occurredAt: Date;
  actorId: string | null;
}

export interface FigureChange<F extends string> {
  field: F;
  from: number | null;
  to: number | null;
  at: Date;
  actorId: string | null;
  first: boolean;
}

const figure = (value: unknown): number | null => (typeof value === 'number' ? value : null);

/** The changes of `fields` across `steps` (in journal order), oldest first; a first recording lists its non-empty figures. */
export function figureChanges<F extends string>(steps: JournalStep[], fields: readonly F[]): FigureChange<F>[] {
  const changes: FigureChange<F>[] = [];
  let previous: Partial<Record<F, number | null>> | null = null;
  for (const step of steps) {
    const present = fields.filter((f) => f in step.payload);
    if (!present.length) continue;
    const state: Partial<Record<F, number | null>> = { ...previous };
    for (const field of present) {
      const to = figure(step.payload[field]);
      const from = previous ? (previous[field] ?? null) : null;
      state[field] = to;
      if (previous ? from === to : to === null) continue;
      changes.push({ field, from, to, at: step.occurredAt, actorId: step.actorId, first: !previous });
    }
    previous = state;
  }
  return changes;
}
