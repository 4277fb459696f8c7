import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CompetitionDayView, EventView, LakeView } from '@shoalbook/shared';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import { User } from '../src/users/user.entity';
import { competitionDays, createEvent, createLake, expectFieldError, expectOk } from './journal-fixtures';
import { ApiClient, type CrewFixture, crewWithMembers, uniqueEmail } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';

/**
 * Names and free text refuse Unicode control characters (general category Cc) with a 400 naming the field;
 * multi-line notes keep tab, line feed and carriage return. OWASP ASVS 4.0.3 5.1.4 (structured data
 * validated against allowed characters); CR/LF in names are how CSV and log injection start.
 * The Cc set per the Unicode Character Database: U+0000–U+001F and U+007F–U+009F.
 */
const NAME_BREAKERS: Array<[string, string]> = [
  ['NUL', 'Bass\u0000Hole'],
  ['CR LF', 'Bass\r\nHole'],
  ['tab', 'Bass\tHole'],
  ['ESC', 'Bass\u001b[31mHole'],
  ['DEL', 'Bass\u007fHole'],
  ['NEL (C1)', 'Bass\u0085Hole'],
];
const NOTE_BREAKERS = NAME_BREAKERS.filter(([label]) => !['CR LF', 'tab'].includes(label));

describe('control characters in names and free text', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let lake: LakeView;
  let event: EventView;
  let day: CompetitionDayView;
  let practiceDayId: string;
  let findId: string;
  let base: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Control Crew');
    base = `/api/crews/${crew.crewId}`;
    lake = await createLake(crew.angler, crew.crewId);
    event = await createEvent(crew.angler, crew.crewId, lake.id);
    [day] = await competitionDays(crew.angler, crew.crewId, event.id);
    practiceDayId = ((await crew.angler.get(`${base}/events/${event.id}/practice-days`)).body as { id: string }[])[0]!
      .id;
    const find = await crew.angler.post(`${base}/finds`, {
      lakeId: lake.id,
      name: 'Point',
      kind: 'other',
      lat: 32.9,
      lon: -96.2,
    });
    expectOk(find, 201);
    findId = find.body.id as string;
  });
  afterAll(async () => {
    await app.close();
  });

  /** [label, method, path, body without the field, field, multiline] for every name and free-text field. */
  const fields = (): Array<[string, 'post' | 'patch', string, object, string, boolean]> => [
    ['crew name', 'post', '/api/crews', {}, 'name', false],
    ['crew rename', 'patch', base, {}, 'name', false],
    ['own display name', 'patch', '/api/auth/me', {}, 'displayName', false],
    ['lake name', 'post', `${base}/lakes`, { timeZone: 'America/Chicago', lat: 32.9, lon: -96.2 }, 'name', false],
    ['lake region', 'patch', `${base}/lakes/${lake.id}`, {}, 'region', false],
    ['lake notes', 'patch', `${base}/lakes/${lake.id}`, {}, 'notes', true],
    ['event name', 'patch', `${base}/events/${event.id}`, {}, 'name', false],
    ['event organiser', 'patch', `${base}/events/${event.id}`, {}, 'organiser', false],
    ['event notes', 'patch', `${base}/events/${event.id}`, {}, 'notes', true],
    ['practice-day notes', 'patch', `${base}/practice-days/${practiceDayId}`, {}, 'notes', true],
    ['competition-day weather notes', 'patch', `${base}/competition-days/${day.id}`, {}, 'weatherNotes', true],
    ['find name', 'post', `${base}/finds`, { lakeId: lake.id, kind: 'other', lat: 32.9, lon: -96.2 }, 'name', false],
    ['find sub-kind', 'patch', `${base}/finds/${findId}`, {}, 'subKind', false],
    ['find notes', 'patch', `${base}/finds/${findId}`, {}, 'notes', true],
    ...(['lure', 'technique', 'notes'] as const).map((field): [string, 'post', string, object, string, boolean] => [
      `catch ${field}`,
      'post',
      `${base}/catches`,
      { competitionDayId: day.id, caughtAt: '08:00', species: 'largemouth', fate: 'released' },
      field,
      field === 'notes',
    ]),
  ];

  const journalRows = () => testEm(app).count(JournalEvent, { crewId: crew.crewId });

  it('refuses each control character in every field with 400 naming the field, and writes nothing', async () => {
    const before = await journalRows();
    const problems: string[] = [];
    for (const [label, method, path, body, field, multiline] of fields()) {
      for (const [what, value] of multiline ? NOTE_BREAKERS : NAME_BREAKERS) {
        const res = await crew.owner[method](path, { ...body, [field]: value });
        const messages = (res.body.fieldErrors?.[field] ?? []).join(' ');
        if (res.status !== 400 || !/control character U\+[0-9A-F]{4}/.test(messages))
          problems.push(`${label} with ${what}: ${res.status} ${JSON.stringify(res.body).slice(0, 160)}`);
      }
    }
    expect(problems).toEqual([]);
    expect(await journalRows()).toBe(before);
  });

  it('keeps tab and line breaks in multi-line notes', async () => {
    const notes = 'Wind from the south\r\n\tshad on the points\nmoved shallow';
    const current = await crew.angler.get(`${base}/finds/${findId}`);
    const res = await crew.angler.patch(`${base}/finds/${findId}`, { notes, version: current.body.version });
    expectOk(res);
    expect(res.body.notes).toBe(notes);
  });

  it('names the character and its position in the message, on sign-up too', async () => {
    const email = uniqueEmail('cc');
    const res = await new ApiClient(app).post('/api/auth/sign-up', {
      email,
      password: 'a fine long passphrase',
      displayName: 'Jo\nTester',
    });
    expectFieldError(res, 'displayName', /control character U\+000A at position 3/);
    expect(await testEm(app).count(User, { email })).toBe(0);
  });
});
