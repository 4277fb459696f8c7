import type { CatchRow, DayRow, EventRow, FindRow, LakeRow, StopRow } from './rows';

/** A table of the state: rows by id, plus the ids whose final state (present or absent) must be written. */
export class StateTable<R> {
  readonly rows = new Map<string, R>();
  readonly changed = new Set<string>();

  constructor(private readonly track: boolean) {}

  get(id: string): R | undefined {
    return this.rows.get(id);
  }

  /** A row as loaded from the read model (not a change). */
  load(id: string, row: R): void {
    if (!this.changed.has(id)) this.rows.set(id, row);
  }

  put(id: string, row: R): void {
    this.rows.set(id, row);
    if (this.track) this.changed.add(id);
  }

  delete(id: string): void {
    this.rows.delete(id);
    if (this.track) this.changed.add(id);
  }

  /** Changed rows still present, and ids removed. */
  changes(): { upserts: R[]; deletes: string[] } {
    const upserts: R[] = [];
    const deletes: string[] = [];
    for (const id of this.changed) {
      const row = this.rows.get(id);
      if (row) upserts.push(row);
      else deletes.push(id);
    }
    return { upserts, deletes };
  }
}

/**
 * What the projector knows while applying journal events: all of the read model during a rebuild, or the rows
 * an incremental batch touches (loaded first). Applying marks which finds' outcomes and which events' group
 * statistics must be recomputed.
 */
export class ProjectionState {
  readonly lakes: StateTable<LakeRow>;
  readonly events: StateTable<EventRow>;
  readonly days: StateTable<DayRow>;
  readonly finds: StateTable<FindRow>;
  readonly catches: StateTable<CatchRow>;
  readonly stops: StateTable<StopRow>;
  /** Finds whose rm_find_outcome rows must be recomputed. */
  readonly dirtyFinds = new Set<string>();
  /** Events whose rm_group_stats rows must be recomputed. */
  readonly dirtyEvents = new Set<string>();
  /** Competition days whose catches' bag states must be counted again (bag-states.ts). */
  readonly dirtyDays = new Set<string>();

  /** @param track record changed ids (incremental batches); a rebuild writes everything instead. */
  constructor(readonly track: boolean) {
    this.lakes = new StateTable(track);
    this.events = new StateTable(track);
    this.days = new StateTable(track);
    this.finds = new StateTable(track);
    this.catches = new StateTable(track);
    this.stops = new StateTable(track);
  }
}
