import type { INestApplication } from '@nestjs/common';
import type { Response } from 'supertest';
import { expect } from 'vitest';
import type { CompetitionDayView, EventView, LakeView } from '@shoalbook/shared';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import type { ApiClient } from './utils/api-client';
import { testEm } from './utils/test-app';

/** Invented test lake: a plausible reservoir position in the US South (America/Chicago). */
export const TEST_LAKE = {
  name: 'Lake Marrowind',
  region: 'Test County',
  timeZone: 'America/Chicago',
  lat: 32.95,
  lon: -96.2,
};

export function expectOk(res: Response, status = 200): void {
  if (res.status !== status)
    throw new Error(`expected ${status}, got ${res.status}: ${JSON.stringify(res.body).slice(0, 600)}`);
}

export async function createLake(client: ApiClient, crewId: string, overrides: object = {}): Promise<LakeView> {
  const res = await client.post(`/api/crews/${crewId}/lakes`, { ...TEST_LAKE, ...overrides });
  expectOk(res, 201);
  return res.body as LakeView;
}

export async function createEvent(
  client: ApiClient,
  crewId: string,
  lakeId: string,
  overrides: object = {},
): Promise<EventView> {
  const res = await client.post(`/api/crews/${crewId}/events`, {
    lakeId,
    name: 'Spring Open',
    organiser: 'Test Trail',
    practiceDates: ['2024-04-10', '2024-04-11'],
    competitionDates: ['2024-04-12', '2024-04-13'],
    ...overrides,
  });
  expectOk(res, 201);
  return res.body as EventView;
}

export async function competitionDays(
  client: ApiClient,
  crewId: string,
  eventId: string,
): Promise<CompetitionDayView[]> {
  const res = await client.get(`/api/crews/${crewId}/events/${eventId}/competition-days`);
  expectOk(res);
  return res.body as CompetitionDayView[];
}

/** Journal rows of one aggregate, in order. */
export async function journalOf(app: INestApplication, aggregateId: string): Promise<JournalEvent[]> {
  return testEm(app).find(JournalEvent, { aggregateId }, { orderBy: { seq: 'asc' } });
}

export async function journalCount(app: INestApplication, crewId: string): Promise<number> {
  return testEm(app).count(JournalEvent, { crewId });
}

/** A GPX 1.1 document from waypoints. */
export function gpxOf(
  waypoints: { lat: number | string; lon: number | string; name?: string; time?: string; depthM?: number }[],
): string {
  const body = waypoints
    .map(
      (w) =>
        `<wpt lat="${w.lat}" lon="${w.lon}">${w.time ? `<time>${w.time}</time>` : ''}${w.name ? `<name>${w.name}</name>` : ''}${
          w.depthM !== undefined
            ? `<extensions><sb:depth xmlns:sb="urn:shoalbook:test">${w.depthM}</sb:depth></extensions>`
            : ''
        }</wpt>`,
    )
    .join('\n');
  return `<?xml version="1.0" encoding="UTF-8"?>\n<gpx version="1.1" creator="shoalbook-test" xmlns="http://www.topografix.com/GPX/1/1">\n${body}\n</gpx>\n`;
}

/** Upload a file as multipart field "file" with the CSRF header. */
export async function upload(
  client: ApiClient,
  path: string,
  content: Buffer | string,
  filename: string,
  fields: Record<string, string> = {},
): Promise<Response> {
  const token = await client.refreshCsrf();
  let req = client.agent.post(path).set('x-csrf-token', token);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), filename);
}

export function expectFieldError(res: Response, field: string, pattern?: RegExp): void {
  expect(res.status, JSON.stringify(res.body)).toBe(400);
  expect(res.body.fieldErrors, JSON.stringify(res.body)).toHaveProperty([field]);
  if (pattern) expect(res.body.fieldErrors[field].join(' ')).toMatch(pattern);
}
