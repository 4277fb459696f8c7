import type { EntityManager } from '@mikro-orm/mariadb';
import { Catch } from '../catches/catch.entity';
import type { JournalRecorder } from '../journal-events/journal-events.service';
import { recordState } from '../journal-events/record-state';
import { Stop } from '../stops/stop.entity';
import type { Find } from './find.entity';

const CHUNK = 1000;

/**
 * Delete finds inside the caller's transaction. Their catches keep their data and lose the attribution;
 * their stops stay (the angler fished there) at the find's position with no find. One journal event per
 * changed record, so the read model and a rebuild agree.
 */
export async function deleteFinds(
  tx: EntityManager,
  log: JournalRecorder,
  crewId: string,
  finds: readonly Find[],
): Promise<{ catchesUnattached: number; stopsUnattached: number }> {
  const byId = new Map(finds.map((f) => [f.id, f]));
  const ids = [...byId.keys()];
  let catchesUnattached = 0;
  let stopsUnattached = 0;
  for (let i = 0; i < ids.length; i += CHUNK) {
    const chunk = ids.slice(i, i + CHUNK);
    const catches = await tx.find(Catch, { crewId, findId: { $in: chunk } });
    for (const c of catches) {
      c.findId = null;
      c.attributionDistanceM = null;
    }
    const stops = await tx.find(Stop, { crewId, findId: { $in: chunk } });
    for (const s of stops) {
      const find = byId.get(s.findId!)!;
      s.findId = null;
      s.lat ??= find.lat;
      s.lon ??= find.lon;
    }
    await tx.flush();
    for (const c of catches)
      log.record({
        type: 'CatchUpdated',
        aggregateType: 'catch',
        aggregateId: c.id,
        payload: recordState(tx, 'Catch', c),
      });
    for (const s of stops)
      log.record({
        type: 'StopUpdated',
        aggregateType: 'stop',
        aggregateId: s.id,
        payload: recordState(tx, 'Stop', s),
      });
    catchesUnattached += catches.length;
    stopsUnattached += stops.length;
  }
  for (const f of finds) {
    tx.remove(f);
    log.record({ type: 'FindDeleted', aggregateType: 'find', aggregateId: f.id, payload: { id: f.id } });
  }
  await tx.flush();
  return { catchesUnattached, stopsUnattached };
}
