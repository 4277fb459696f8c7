import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { Mock } from 'vitest';
import { describe, expect, it } from 'vitest';
import { fakeNetwork } from '../../../testing/fake-network';
import { events, hitRates, lakes, me, renderReports, withLaidOutElements } from '../testing/report-test-kit';

withLaidOutElements(1200, 700);

const readings = [
  'Hard bottom produced on 14 of 40 finds fished (35 %, 22–50 %).',
  'Bait produced on 2 of 3 finds fished (67 %, 21–94 %): too few finds to rank it with confidence.',
];
const byKind = hitRates(
  [
    ['hard-bottom', 'Hard bottom', 14, 40],
    ['vegetation', 'Vegetation', 3, 25],
    ['bait', 'Bait', 2, 3],
  ],
  readings,
);
const byDepth = hitRates(
  [
    ['0-10', '0–10 ft', 4, 30],
    ['10-20', '10–20 ft', 15, 38],
  ],
  [],
);

function network() {
  return fakeNetwork({
    'GET /api/auth/me': { status: 200, body: me },
    'GET /api/crews/crew-1/lakes': { status: 200, body: lakes },
    'GET /api/crews/crew-1/events': { status: 200, body: events },
    'GET /api/crews/crew-1/reports/hit-rates': (request) => ({
      status: 200,
      body: request.path && reportFor(lastUrl(net)),
    }),
  }).install();
}
let net: ReturnType<typeof fakeNetwork>;

/** The full address of the latest report request (the fake network keeps paths only). */
function lastUrl(n: ReturnType<typeof fakeNetwork>): URL {
  const calls = (n.fetch as unknown as Mock).mock.calls.map((c) => new URL(String(c[0]), 'http://shoalbook.test'));
  return calls.filter((u) => u.pathname.endsWith('/reports/hit-rates')).at(-1)!;
}
function reportFor(url: URL) {
  return url.searchParams.get('by') === 'depthBand' ? byDepth : byKind;
}

describe('Hit-rate report', () => {
  it('says what the headline counts (fish caught and counted) and the fish per hour fished, per group too', async () => {
    net = network();
    await renderReports('/crews/crew-1/reports/hit-rates');
    // 14 + 3 + 2 = 19 of 68 finds produced; the kit gives each producing find 2 fish (1 counted) and each find
    // fished half an hour: 38 fish over 34 h = 1.12 fish per hour; hard bottom 28 fish over 20 h = 1.40.
    expect(
      await screen.findByText(
        /^Overall, 19 of 68 finds fished produced a fish \(28 %, likely .*\); 38 fish caught, 19 counted, 1\.12 \/h over 34 h 00 min fished\.$/,
      ),
    ).toBeInTheDocument();
    const table = await screen.findByRole('table', { name: /^Time on the finds by group/ });
    const hard = within(table)
      .getAllByRole('row')
      .find((r) => within(r).queryByRole('rowheader')?.textContent === 'Hard bottom')!;
    expect(within(hard).getByText('1.40 /h')).toBeInTheDocument();
    expect(within(hard).getByText('20 h 00 min')).toBeInTheDocument();
    expect(screen.queryByText('derived from catches')).not.toBeInTheDocument();
  });

  it('times the fish per hour by clock band too, over the time on the water in each band', async () => {
    const byClock = {
      ...hitRates(
        [
          ['early', 'Early', 0, 0],
          ['morning', 'Morning', 3, 3],
        ],
        [],
      ),
      by: 'timeOfDay' as const,
      unit: 'catch' as const,
    };
    // An hour early with no fish, 90 minutes in the morning with 6 fish: 4.00 per hour.
    byClock.groups[0] = { ...byClock.groups[0]!, secondsFished: 3600, fishPerHour: 0 };
    byClock.groups[1] = { ...byClock.groups[1]!, secondsFished: 5400, fishPerHour: 4 };
    net = fakeNetwork({
      'GET /api/auth/me': { status: 200, body: me },
      'GET /api/crews/crew-1/lakes': { status: 200, body: lakes },
      'GET /api/crews/crew-1/events': { status: 200, body: events },
      'GET /api/crews/crew-1/reports/hit-rates': { status: 200, body: byClock },
    }).install();
    await renderReports('/crews/crew-1/reports/hit-rates?by=timeOfDay');
    expect(
      await screen.findByText(/^6 fish caught, 3 counted, .* in all; 4\.00 \/h over 1 h 30 min on the water\./),
    ).toBeInTheDocument();
    const table = await screen.findByRole('table', { name: /^Time on the water in each period/ });
    const row = (label: string) =>
      within(table)
        .getAllByRole('row')
        .find((r) => within(r).queryByRole('rowheader')?.textContent === label)!;
    expect(within(row('Early')).getByText('0.00 /h')).toBeInTheDocument();
    expect(within(row('Morning')).getByText('4.00 /h')).toBeInTheDocument();
    expect(within(row('Morning')).getByText('1 h 30 min')).toBeInTheDocument();
  });

  it('marks the figures derived from catches when an event of the selection has catches but no stops', async () => {
    net = fakeNetwork({
      'GET /api/auth/me': { status: 200, body: me },
      'GET /api/crews/crew-1/lakes': { status: 200, body: lakes },
      'GET /api/crews/crew-1/events': { status: 200, body: events },
      'GET /api/crews/crew-1/reports/hit-rates': { status: 200, body: { ...byKind, derivedEvents: 1 } },
    }).install();
    await renderReports('/crews/crew-1/reports/hit-rates');
    expect(await screen.findByText('derived from catches')).toBeInTheDocument();
    expect(screen.getByText(/One event here has catches but no stops/)).toBeInTheDocument();
  });

  it('shows the groups in a table, the chart with a whisker per group, and the readings in plain words', async () => {
    net = network();
    const { container } = await renderReports('/crews/crew-1/reports/hit-rates');
    const table = await screen.findByRole('table', { name: /^(Hit rates|Fish) by group/ });
    const rows = within(table).getAllByRole('row').slice(1);
    const hard = rows.find((r) => within(r).getByRole('rowheader').textContent === 'Hard bottom')!;
    expect(within(hard).getByText('35 %')).toBeInTheDocument();
    expect(within(hard).getByText('22–50 %')).toBeInTheDocument();
    // The thin group carries its tag in the table too.
    const bait = rows.find((r) => within(r).getByRole('rowheader').textContent?.startsWith('Bait'))!;
    expect(within(bait).getByText('few finds')).toBeInTheDocument();
    expect(container.querySelectorAll('.sb-whisker')).toHaveLength(3);
    const list = screen.getByRole('heading', { name: 'In plain words' }).closest('section')!;
    expect(
      within(list)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual(readings);
  });

  it('lists the groups in the order of the API’s small-sample-aware rank, with the adjusted rate beside the raw one', async () => {
    net = network();
    await renderReports('/crews/crew-1/reports/hit-rates');
    const table = await screen.findByRole('table', { name: /^(Hit rates|Fish) by group/ });
    const shown = within(table)
      .getAllByRole('rowheader')
      .map((h) => h.textContent?.replace('few finds', ''));
    const byRank = [...byKind.groups].sort((x, y) => (x.rank ?? 99) - (y.rank ?? 99)).map((g) => g.label);
    expect(shown).toEqual(byRank);
    const veg = within(table).getByRole('rowheader', { name: 'Vegetation' }).closest('tr')!;
    const vegGroup = byKind.groups.find((g) => g.key === 'vegetation')!;
    expect(within(veg).getByText(`${Math.round((vegGroup.producing.shrunk ?? 0) * 100)} %`)).toBeInTheDocument();
    expect(within(veg).getAllByRole('cell').at(-1)!.textContent).toBe(String(vegGroup.rank));
  });

  it('keeps the filters and the grouping in the address and sends them to the API', async () => {
    net = network();
    const user = userEvent.setup();
    const { router } = await renderReports('/crews/crew-1/reports/hit-rates?season=summer');
    await screen.findByRole('table', { name: /^(Hit rates|Fish) by group/ });
    expect(screen.getByRole('combobox', { name: 'Season' })).toHaveValue('summer');
    expect(lastUrl(net).searchParams.get('season')).toBe('summer');

    await user.selectOptions(screen.getByRole('combobox', { name: 'Lake' }), 'lake-a');
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('lakeId')).toBe('lake-a'));
    await waitFor(() => expect(lastUrl(net).searchParams.get('lakeId')).toBe('lake-a'));
    expect(lastUrl(net).searchParams.get('season')).toBe('summer');
    // Only the chosen lake's events are offered.
    const eventOptions = within(screen.getByRole('combobox', { name: 'Event' }))
      .getAllByRole('option')
      .map((o) => o.getAttribute('value'));
    expect(eventOptions).toEqual(['', 'ev-1', 'ev-2']);

    await user.click(screen.getByRole('button', { name: 'Depth' }));
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('by')).toBe('depthBand'));
    await within(await screen.findByRole('table', { name: /^Hit rates by group/ })).findByRole('rowheader', {
      name: '10–20 ft',
    });
    expect(lastUrl(net).searchParams.get('by')).toBe('depthBand');
    expect(new URLSearchParams(router.state.location.search).get('lakeId')).toBe('lake-a');

    await user.click(screen.getByRole('button', { name: 'Clear filters' }));
    await waitFor(() => expect(router.state.location.search).toBe('?by=depthBand'));
  });

  it('drops malformed filters from the address instead of sending them on', async () => {
    net = network();
    await renderReports('/crews/crew-1/reports/hit-rates?season=monsoon&year=24&from=yesterday&lakeId=lake-b');
    await screen.findByRole('table', { name: /^(Hit rates|Fish) by group/ });
    const sent = lastUrl(net).searchParams;
    expect([...sent.keys()].sort()).toEqual(['by', 'lakeId']);
    expect(sent.get('lakeId')).toBe('lake-b');
  });

  it('says what to enter when nothing has been fished yet', async () => {
    fakeNetwork({
      'GET /api/auth/me': { status: 200, body: me },
      'GET /api/crews/crew-1/lakes': { status: 200, body: lakes },
      'GET /api/crews/crew-1/events': { status: 200, body: events },
      'GET /api/crews/crew-1/reports/hit-rates': { status: 200, body: hitRates([], []) },
    }).install();
    await renderReports('/crews/crew-1/reports/hit-rates');
    expect(await screen.findByText('No finds fished for these filters yet')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to the finds' })).toHaveAttribute('href', '/crews/crew-1/finds');
  });
});
