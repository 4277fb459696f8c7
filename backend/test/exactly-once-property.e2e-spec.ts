import type { INestApplication } from '@nestjs/common';
import fc from 'fast-check';
import type { Response } from 'supertest';
import { v7 as uuidv7 } from 'uuid';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CatchView, CompetitionDayView } from '@shoalbook/shared';
import { Catch } from '../src/catches/catch.entity';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';
import { competitionDays, createEvent, createLake, expectOk, journalOf } from './journal-fixtures';

/*
 * A property of the server half of the send queue (draft-ietf-httpapi-idempotency-key-header-07 §2.6: a repeated
 * request with the same key and payload gets the first answer and changes nothing). A client on a bad network
 * sends each write of a random sequence — log a catch, change its weight, delete it — with its own key; before
 * the try that gets through, up to three answers are lost on the way back (the server did the work, the client
 * never heard), so the client sends again with the same key (a try lost on the way out never reaches the
 * server, so it has nothing to test there); afterwards, some acknowledged entries are sent once more (a crash
 * between "sent" and "acknowledged").
 * The server's rows and journal must equal the writes made, each once.
 */
type Write = { kind: 'log'; weightLb: number } | { kind: 'edit' | 'delete'; target: number; weightLb: number };

const weightLb = fc.integer({ min: 50, max: 900 }).map((x) => x / 100);
const write: fc.Arbitrary<Write> = fc.oneof(
  fc.record({ kind: fc.constant('log' as const), weightLb }),
  fc.record({ kind: fc.constantFrom('edit' as const, 'delete' as const), target: fc.nat(), weightLb }),
);
const scenario = fc.record({
  writes: fc.array(fc.record({ write, answersLost: fc.nat({ max: 3 }) }), { minLength: 1, maxLength: 6 }),
  resent: fc.array(fc.nat(), { maxLength: 3 }),
});

/** What the client knows of a catch it logged: the last answer's version and weight, and what it did to it. */
interface Known {
  id: string;
  version: number;
  weightLb: number;
  journal: string[];
  deleted: boolean;
}

describe('exactly once over a bad network (property)', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let base: string;
  let day: CompetitionDayView;

  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Bad Network Crew');
    base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.angler, crew.crewId);
    const event = await createEvent(crew.angler, crew.crewId, lake.id);
    [day] = await competitionDays(crew.angler, crew.crewId, event.id);
  });
  afterAll(async () => {
    await app.close();
  });

  it('the rows and the journal equal the writes made, each once', { timeout: 240_000 }, async () => {
    await fc.assert(
      fc.asyncProperty(scenario, async ({ writes, resent }) => {
        const known: Known[] = [];
        const sent: {
          method: 'post' | 'patch' | 'delete';
          path: string;
          body?: object;
          key: string;
          first: Response;
        }[] = [];
        for (const { write: w, answersLost } of writes) {
          const live = known.filter((k) => !k.deleted);
          const target = w.kind === 'log' || !live.length ? undefined : live[w.target % live.length]!;
          if (w.kind !== 'log' && !target) continue; // nothing to change yet: the angler could not have done it
          const id = uuidv7();
          const request =
            w.kind === 'log'
              ? {
                  method: 'post' as const,
                  path: `${base}/catches`,
                  body: {
                    id,
                    competitionDayId: day.id,
                    caughtAt: '08:15',
                    species: 'largemouth',
                    weightLb: w.weightLb,
                    fate: 'weighed',
                  },
                }
              : w.kind === 'edit'
                ? {
                    method: 'patch' as const,
                    path: `${base}/catches/${target!.id}`,
                    body: { version: target!.version, weightLb: w.weightLb },
                  }
                : { method: 'delete' as const, path: `${base}/catches/${target!.id}`, body: undefined };
          const key = uuidv7();
          const send = () =>
            crew.angler.send(request.method, request.path, request.body, { 'Idempotency-Key': `"${key}"` });
          for (let i = 0; i < answersLost; i++) await send(); // the answer is lost: the client retries
          const first = await send();
          expectOk(first, w.kind === 'log' ? 201 : w.kind === 'edit' ? 200 : 204);
          sent.push({ ...request, key, first });
          if (w.kind === 'log') {
            const view = first.body as CatchView;
            known.push({ id, version: view.version!, weightLb: w.weightLb, journal: ['CatchLogged'], deleted: false });
          } else if (w.kind === 'edit') {
            Object.assign(target!, { version: (first.body as CatchView).version!, weightLb: w.weightLb });
            target!.journal.push('CatchUpdated');
          } else {
            target!.deleted = true;
            target!.journal.push('CatchDeleted');
          }
        }
        // Acknowledged entries sent again: the first answer, nothing written.
        for (const i of resent) {
          if (!sent.length) break;
          const s = sent[i % sent.length]!;
          const again = await crew.angler.send(s.method, s.path, s.body, { 'Idempotency-Key': `"${s.key}"` });
          expect(again.status).toBe(s.first.status);
          expect(again.body).toEqual(s.first.body);
        }
        for (const k of known) {
          expect((await journalOf(app, k.id)).map((e) => e.type)).toEqual(k.journal);
          const row = await testEm(app).findOne(Catch, { id: k.id });
          if (k.deleted) expect(row, 'a deleted catch is gone').toBeNull();
          else expect(row?.weightLb, 'a live catch has its last weight').toBe(k.weightLb);
        }
      }),
      { numRuns: 20, seed: 20261204, endOnFailure: true },
    );
  });
});
