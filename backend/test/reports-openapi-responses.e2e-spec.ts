import type { EntityManager } from '@mikro-orm/core';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { HIT_RATE_GROUPINGS } from '@shoalbook/shared';
import { Crew } from '../src/crews/crew.entity';
import { DEMO_CREW_NAME } from '../src/database/seeders/demo-accounts';
import { JournalDemoSeeder } from '../src/database/seeders/journal-demo.seeder';
import { JournalProjector } from '../src/projections/journal-projector.service';
import { waitForProjection } from './reports-support';
import { type ApiClient, crewWithMembers, type CrewFixture, makeAdmin, newUser } from './utils/api-client';
import { type OpenApiDocument, responseValidator, toJsonSchema } from './utils/openapi-responses';
import { waitForMail } from './utils/outbox';
import { createTestApp, testEm } from './utils/test-app';

const REPORTS = '/api/crews/{crewId}/reports';

/** Real answers of every report route, on the demo journal and on a crew with nothing logged, against the document. */
describe('report answers match their OpenAPI response schemas', () => {
  let app: INestApplication;
  let doc: OpenApiDocument;
  let check: ReturnType<typeof responseValidator>;
  let demo: CrewFixture;
  let empty: CrewFixture;
  const covered = new Set<string>();

  beforeAll(async () => {
    app = await createTestApp();
    doc = (await request(app.getHttpServer()).get('/api/docs-json')).body as OpenApiDocument;
    check = responseValidator(doc);
    demo = await crewWithMembers(app, DEMO_CREW_NAME);
    const em = testEm(app);
    await new JournalDemoSeeder().run(em as unknown as EntityManager, {
      crews: { [DEMO_CREW_NAME]: em.getReference(Crew, demo.crewId) },
      users: {},
    });
    // The seeder writes the journal without publishing, as before a start-up; ask the projector to catch up.
    await app.get(JournalProjector).requestCatchUp();
    empty = await crewWithMembers(app, 'Empty Report Crew');
    await waitForProjection(app);
  });
  afterAll(async () => {
    await app.close();
  });

  /** What the answers of the running test got wrong against the documented schemas. */
  let problems: string[] = [];
  beforeEach(() => {
    problems = [];
  });

  /** Calls a route and notes the problems of its answer against the documented schema for that status. */
  async function answer(
    client: ApiClient,
    method: 'get' | 'post',
    template: string,
    values: Record<string, string>,
    opts: { query?: string; body?: object; status: number },
  ): Promise<void> {
    const url =
      template.replace(/\{(\w+)\}/g, (_, name: string) => values[name]!) + (opts.query ? `?${opts.query}` : '');
    const res = method === 'get' ? await client.get(url) : await client.post(url, opts.body);
    if (res.status !== opts.status) {
      problems.push(`${method.toUpperCase()} ${url}: ${res.status} ${JSON.stringify(res.body)}`);
      return;
    }
    covered.add(`${method.toUpperCase()} ${template}`);
    problems.push(...check(method, template, res.status, res.body));
  }

  const listOf = async <T>(client: ApiClient, crewId: string, what: string) =>
    (await client.get(`/api/crews/${crewId}/${what}`)).body as T[];

  it('the demo journal: every grouping, lake and event, as owner and as viewer (positions hidden)', async () => {
    const crewId = demo.crewId;
    const lakes = await listOf<{ id: string }>(demo.owner, crewId, 'lakes');
    const events = await listOf<{ id: string }>(demo.owner, crewId, 'events');
    expect(lakes.length).toBeGreaterThan(1);
    expect(events.length).toBeGreaterThan(1);
    for (const by of HIT_RATE_GROUPINGS) {
      await answer(demo.viewer, 'get', `${REPORTS}/hit-rates`, { crewId }, { query: `by=${by}`, status: 200 });
      for (const lake of lakes)
        await answer(
          demo.viewer,
          'get',
          `${REPORTS}/lake-comparison`,
          { crewId },
          { query: `lakeId=${lake.id}&by=${by}`, status: 200 },
        );
    }
    for (const event of events) {
      await answer(
        demo.viewer,
        'get',
        `${REPORTS}/events/{eventId}/recap`,
        { crewId, eventId: event.id },
        { status: 200 },
      );
      await answer(
        demo.viewer,
        'get',
        `${REPORTS}/events/{eventId}/finds`,
        { crewId, eventId: event.id },
        { status: 200 },
      );
    }
    await answer(demo.viewer, 'get', `${REPORTS}/timing`, { crewId }, { status: 200 });
    for (const lake of lakes) {
      await answer(
        demo.angler,
        'get',
        `${REPORTS}/timing`,
        { crewId },
        { query: `lakeId=${lake.id}&season=spring`, status: 200 },
      );
      for (const client of [demo.owner, demo.viewer])
        await answer(client, 'get', `${REPORTS}/find-map`, { crewId }, { query: `lakeId=${lake.id}`, status: 200 });
    }
    await answer(
      demo.owner,
      'post',
      `${REPORTS}/events/{eventId}/recap-email`,
      { crewId, eventId: events[0]!.id },
      { body: { userIds: [demo.angler.userId] }, status: 202 },
    );
    await waitForMail(demo.angler.email, 1, /recap|Recap/);
    expect(problems).toEqual([]);
  });

  it('a crew with nothing logged: empty groups, rates without trials, a lake and an event without catches', async () => {
    const crewId = empty.crewId;
    for (const by of HIT_RATE_GROUPINGS)
      await answer(empty.owner, 'get', `${REPORTS}/hit-rates`, { crewId }, { query: `by=${by}`, status: 200 });
    await answer(empty.owner, 'get', `${REPORTS}/timing`, { crewId }, { status: 200 });
    const lake = await empty.owner.post(`/api/crews/${crewId}/lakes`, {
      name: 'Lake Brackenfold',
      region: 'Test County',
      timeZone: 'America/Chicago',
      lat: 33.1,
      lon: -96.4,
    });
    expect(lake.status, JSON.stringify(lake.body)).toBe(201);
    const lakeId = (lake.body as { id: string }).id;
    await waitForProjection(app);
    await answer(
      empty.owner,
      'get',
      `${REPORTS}/lake-comparison`,
      { crewId },
      { query: `lakeId=${lakeId}`, status: 200 },
    );
    await answer(empty.owner, 'get', `${REPORTS}/find-map`, { crewId }, { query: `lakeId=${lakeId}`, status: 200 });
    const event = await empty.owner.post(`/api/crews/${crewId}/events`, {
      lakeId,
      name: 'Spring Opener',
      practiceDates: ['2026-03-13'],
      competitionDates: ['2026-03-14'],
    });
    expect(event.status, JSON.stringify(event.body)).toBe(201);
    const eventId = (event.body as { id: string }).id;
    await waitForProjection(app);
    await answer(empty.owner, 'get', `${REPORTS}/events/{eventId}/recap`, { crewId, eventId }, { status: 200 });
    await answer(empty.owner, 'get', `${REPORTS}/events/{eventId}/finds`, { crewId, eventId }, { status: 200 });
    await answer(
      empty.owner,
      'get',
      `${REPORTS}/lake-comparison`,
      { crewId },
      { query: `lakeId=${lakeId}&by=hardness`, status: 200 },
    );
    expect(problems).toEqual([]);
  });

  it('the site-admin rebuild answer', async () => {
    const admin = await newUser(app, 'admin');
    await makeAdmin(app, admin.userId);
    await answer(admin, 'post', '/api/admin/projections/rebuild', {}, { status: 200 });
    expect(problems).toEqual([]);
  });

  it('covered every report route of the document', () => {
    const documented = Object.entries(doc.paths)
      .filter(([path]) => path.startsWith(`${REPORTS}/`))
      .flatMap(([path, item]) => Object.keys(item).map((method) => `${method.toUpperCase()} ${path}`));
    expect(documented.length).toBeGreaterThanOrEqual(7);
    expect(documented.filter((key) => !covered.has(key))).toEqual([]);
  });

  it('the check refuses a wrong answer: a null where none is allowed, an undocumented field, a value outside its enum', () => {
    expect(toJsonSchema({ $ref: '#/components/schemas/TimingViewDto' })).toEqual({
      $ref: 'openapi.json#/definitions/TimingViewDto',
    });
    const timing = (body: object) => check('get', `${REPORTS}/timing`, 200, body);
    const id = '0b7f6f0e-2d7b-4a40-9d53-6f0c7b1d2e3f';
    const point = {
      catchId: id,
      caughtAt: '2026-03-14T14:05:00.000Z',
      localMinutes: 545,
      minutesFromSunrise: null,
      solunarPeriod: null,
      weightLb: 3.1,
      fate: 'weighed',
      eventId: id,
      day: '2026-03-14',
    };
    expect(timing({ catches: [point], totalCatches: 1, byHour: [{ hour: 9, fishCount: 1, weightLb: 3.1 }] })).toEqual(
      [],
    );
    expect(timing({ catches: [point], byHour: [] }).join()).toContain('totalCatches');
    expect(timing({ catches: [{ ...point, weightLb: null }], totalCatches: 1, byHour: [] }).join()).toContain(
      '.catches[0].weightLb should be number',
    );
    expect(timing({ catches: [{ ...point, lat: 32.9 }], totalCatches: 1, byHour: [] }).join()).toContain('lat');
    expect(timing({ catches: [{ ...point, solunarPeriod: 'none' }], totalCatches: 1, byHour: [] }).join()).toContain(
      '.catches[0].solunarPeriod should be equal to one of the allowed values',
    );
    expect(
      timing({ catches: [], totalCatches: 1, byHour: [{ hour: 24, fishCount: 1, weightLb: 1 }] }).join(),
    ).toContain('.byHour[0].hour should be <= 23');
  });
});
