import type { Page } from 'playwright-core';
import { apiCall } from './browser';

/** The rules the browser tests' events use: a five-fish limit, 12 in, quarter-pound penalties (common practice). */
const TEST_RULES = {
  fishPerDay: 5,
  minLengthIn: 12,
  deadFishPenaltyLb: 0.25,
  shortFishPenaltyLb: 0.25,
  latePenaltyLbPerMinute: 1,
};

export interface TestEventSpec {
  lake: { name: string; lat: number; lon: number };
  event: string;
  competitionDate: string;
  practiceDates?: string[];
  ramp?: { lat: number; lon: number };
  /** The competition day's start and check-in on the lake clock (America/Chicago). */
  hours?: { startTime: string; checkInTime: string };
}

/**
 * Through the API, as the signed-in user of `page`: a lake (America/Chicago) and an event on it with one
 * competition day and that day's hours. Invented test data; `crewApi` is "/crews/<id>".
 */
export async function createTestEvent(
  page: Page,
  crewApi: string,
  {
    lake,
    event,
    competitionDate,
    practiceDates = [],
    ramp,
    hours = { startTime: '06:30', checkInTime: '15:00' },
  }: TestEventSpec,
): Promise<{ lakeId: string; eventId: string; dayId: string }> {
  const { id: lakeId } = await apiCall<{ id: string }>(page, 'POST', `${crewApi}/lakes`, {
    ...lake,
    region: 'Test county',
    timeZone: 'America/Chicago',
    areaAcres: null,
    notes: '',
  });
  const { id: eventId } = await apiCall<{ id: string }>(page, 'POST', `${crewApi}/events`, {
    lakeId,
    name: event,
    organiser: 'Test trail',
    practiceDates,
    competitionDates: [competitionDate],
    rules: TEST_RULES,
    entryFee: null,
    payout: null,
    finalPlace: null,
    ...(ramp ? { ramp } : {}),
    notes: '',
  });
  const [day] = await apiCall<{ id: string; version: number }[]>(
    page,
    'GET',
    `${crewApi}/events/${eventId}/competition-days`,
  );
  await apiCall(page, 'PATCH', `${crewApi}/competition-days/${day.id}`, { version: day.version, ...hours });
  return { lakeId, eventId, dayId: day.id };
}

/** Fill the catch form by its labels and log it; without signal the form says "waiting to send" for it. */
export async function logCatchOffline(page: Page, c: { time: string; weight: string; length: string }) {
  const form = page.getByRole('form', { name: /Log a catch/ });
  await form.getByRole('textbox', { name: /^Time/ }).fill(c.time);
  await form.getByRole('textbox', { name: /^Weight/ }).fill(c.weight);
  await form.getByRole('textbox', { name: /^Length/ }).fill(c.length);
  await form.getByRole('button', { name: 'Log catch' }).click();
  await form
    .getByRole('status')
    .filter({ hasText: 'Waiting to send' })
    .filter({ hasText: `at ${c.time}` })
    .waitFor({ timeout: 30_000 });
}
