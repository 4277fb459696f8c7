import type { INestApplication } from '@nestjs/common';
import { EventBus } from '@nestjs/cqrs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import { JournalEventsAppended } from '../src/journal-events/journal-events-appended.event';
import { JournalEventsService } from '../src/journal-events/journal-events.service';
import { recordState } from '../src/journal-events/record-state';
import { Lake } from '../src/lakes/lake.entity';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';
import { createLake, journalCount, journalOf } from './journal-fixtures';

describe('journal_event: written with the change, in one transaction, published after commit', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Journal Crew');
  });
  afterAll(async () => {
    await app.close();
  });

  it('carries the full record state and publishes one summary after the commit', async () => {
    const heard: JournalEventsAppended[] = [];
    const sub = app.get(EventBus).subscribe((e) => e instanceof JournalEventsAppended && heard.push(e));
    const lake = await createLake(crew.angler, crew.crewId, { notes: 'full state' });
    sub.unsubscribe();
    const [row] = await journalOf(app, lake.id);
    expect(row!.payload).toEqual({
      id: lake.id,
      crewId: crew.crewId,
      name: 'Lake Marrowind',
      region: 'Test County',
      timeZone: 'America/Chicago',
      lat: 32.95,
      lon: -96.2,
      areaAcres: null,
      notes: 'full state',
      version: 1,
      createdAt: expect.any(String),
      updatedAt: expect.any(String),
    });
    expect(heard.find((e) => e.events.some((x) => x.aggregateId === lake.id))).toMatchObject({
      crewId: crew.crewId,
      events: [{ type: 'LakeCreated', aggregateType: 'lake' }],
    });
  });

  it('leaves neither the record nor its event when the journal insert fails after the record was flushed', async () => {
    const journal = app.get(JournalEventsService);
    const em = testEm(app);
    const lakesBefore = await em.count(Lake, { crewId: crew.crewId });
    const eventsBefore = await journalCount(app, crew.crewId);
    const attempt = journal.transaction(crew.crewId, crew.angler.userId, async (tx, log) => {
      const lake = tx.create(Lake, { crewId: crew.crewId, name: 'Doomed', timeZone: 'UTC', lat: 0, lon: 0 });
      await tx.flush(); // the lake row is written inside the transaction …
      log.record({
        type: 'LakeCreated',
        aggregateType: 'lake',
        aggregateId: lake.id,
        payload: recordState(tx, 'Lake', lake),
      });
      // … and a second event with an aggregate id too long for its column makes the journal insert fail.
      log.record({ type: 'LakeUpdated', aggregateType: 'lake', aggregateId: 'x'.repeat(80), payload: {} });
    });
    await expect(attempt).rejects.toThrow();
    expect(await em.count(Lake, { crewId: crew.crewId })).toBe(lakesBefore);
    expect(await em.count(Lake, { name: 'Doomed' })).toBe(0);
    expect(await journalCount(app, crew.crewId)).toBe(eventsBefore);
  });

  it('a refused command (stale version) leaves the record and the journal as they were', async () => {
    const lake = await createLake(crew.angler, crew.crewId);
    const eventsBefore = await journalCount(app, crew.crewId);
    const res = await crew.angler.patch(`/api/crews/${crew.crewId}/lakes/${lake.id}`, { name: 'Stale', version: 7 });
    expect(res.status).toBe(409);
    expect(await journalCount(app, crew.crewId)).toBe(eventsBefore);
    expect((await testEm(app).findOneOrFail(Lake, { id: lake.id })).name).toBe('Lake Marrowind');
  });

  it('keeps seq strictly increasing in commit order', async () => {
    await createLake(crew.angler, crew.crewId, { name: 'Seq one' });
    await createLake(crew.angler, crew.crewId, { name: 'Seq two' });
    const rows = await testEm(app).find(JournalEvent, { crewId: crew.crewId }, { orderBy: { seq: 'asc' } });
    const seqs = rows.map((r) => BigInt(r.seq));
    expect(seqs.every((s, i) => i === 0 || s > seqs[i - 1]!)).toBe(true);
    expect(rows.slice(-2).map((r) => r.payload.name)).toEqual(['Seq one', 'Seq two']);
  });
});
