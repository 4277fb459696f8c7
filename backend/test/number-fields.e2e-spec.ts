import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp } from './utils/test-app';
import { competitionDays, createEvent, createLake, expectFieldError, expectOk, journalCount } from './journal-fixtures';

/**
 * Weights, lengths and weigh-in figures travel as JSON numbers. A string such as "18,500" (or "18.5") is
 * never read into a number on the server, where the typist's locale is unknown: 400 naming the field,
 * nothing written.
 */
describe('number fields refuse anything but a JSON number', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let base: string;
  let dayId: string;
  let eventId: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Typed Numbers Crew');
    base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.angler, crew.crewId);
    const event = await createEvent(crew.angler, crew.crewId, lake.id);
    eventId = event.id;
    dayId = (await competitionDays(crew.angler, crew.crewId, event.id))[0]!.id;
  });
  afterAll(async () => {
    await app.close();
  });

  const catchBody = (extra: object) => ({
    competitionDayId: dayId,
    caughtAt: '08:10',
    species: 'largemouth',
    fate: 'weighed',
    weightLb: 3.45,
    ...extra,
  });

  it('a catch with a weight or length as text: 400 on that field, no journal row', async () => {
    const before = await journalCount(app, crew.crewId);
    const cases: [object, string][] = [
      [{ weightLb: '18,500' }, 'weightLb'],
      [{ weightLb: '18.5' }, 'weightLb'],
      [{ weightLb: undefined, weight: { value: '18,500', unit: 'lb' } }, 'weight.value'],
      [{ weightLb: undefined, weight: { value: 3, unit: 'lb-oz', ounces: '8' } }, 'weight.ounces'],
      [{ lengthIn: '15,5' }, 'lengthIn'],
      [{ length: { value: '387', unit: 'mm' } }, 'length.value'],
      [{ weightLb: true }, 'weightLb'],
      [{ lengthIn: [15] }, 'lengthIn'],
    ];
    for (const [extra, field] of cases)
      expectFieldError(await crew.angler.post(`${base}/catches`, catchBody(extra)), field);
    expect(await journalCount(app, crew.crewId)).toBe(before);
  });

  it('a catch edit with a weight as text: 400 on that field, the catch unchanged', async () => {
    const logged = await crew.angler.post(`${base}/catches`, catchBody({}));
    expectOk(logged, 201);
    const path = `${base}/catches/${logged.body.id}`;
    expectFieldError(await crew.angler.patch(path, { weightLb: '3,54', version: 1 }), 'weightLb');
    expectFieldError(
      await crew.angler.patch(path, { length: { value: '15.5', unit: 'in' }, version: 1 }),
      'length.value',
    );
    const now = await crew.angler.get(path);
    expect(now.body).toMatchObject({ weightLb: 3.45, version: 1 });
  });

  it('official weigh-in figures as text: 400 on that field, nothing recorded', async () => {
    const path = `${base}/competition-days/${dayId}/weigh-in`;
    const before = await journalCount(app, crew.crewId);
    for (const field of ['grossLb', 'penaltyLb', 'officialLb'])
      expectFieldError(await crew.angler.send('put', path, { [field]: '17,62' }), field);
    expect(await journalCount(app, crew.crewId)).toBe(before);
    const view = await crew.angler.get(`${base}/events/${eventId}/weigh-ins`);
    expect(view.body.days[0].official).toBeNull();
  });

  it('event rules with a weight or length as text: 400 on that field', async () => {
    const lake = await createLake(crew.angler, crew.crewId, { name: 'Rules lake' });
    const body = (rules: object) => ({
      lakeId: lake.id,
      name: 'Text rules',
      competitionDates: ['2024-05-01'],
      rules: { fishPerDay: 5, ...rules },
    });
    expectFieldError(await crew.angler.post(`${base}/events`, body({ minLengthIn: '12' })), 'rules.minLengthIn');
    expectFieldError(
      await crew.angler.post(`${base}/events`, body({ deadFishPenaltyLb: '0,25' })),
      'rules.deadFishPenaltyLb',
    );
  });
});
