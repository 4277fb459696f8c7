// Routes only the benchmark server has: the same figures computed ad hoc over the write tables, a bare SELECT
// of the read-model rows, and a bare write route. They sit behind the same session and crew guards as the
// report routes, so the comparison is side by side through the same HTTP stack.
import { EntityManager } from '@mikro-orm/mariadb';
import { Controller, Get, HttpCode, Module, Param, Post, Query } from '@nestjs/common';
import { CrewRoute } from '../src/crews/access/crew.decorators';
import { groupRates, ranks } from '../src/reports/rates';
import { compareProportions } from '@shoalbook/analytics';

/** (find, event) pairs fished on a lake — marked in the event or caught on in it — with their catches, grouped by kind. */
const AD_HOC_BY_KIND = `
  SELECT x.event_id, f.kind, COUNT(*) AS finds, SUM(x.fish > 0) AS producing, SUM(x.weighed > 0) AS weighed_finds, SUM(x.fish) AS fish, SUM(x.w) AS weight_lb
    FROM (
      SELECT p.find_id, p.event_id, COUNT(c.id) AS fish, SUM(c.fate = 'weighed') AS weighed, COALESCE(SUM(c.weight_lb), 0) AS w
        FROM (
          SELECT id AS find_id, event_id FROM finds WHERE crew_id = ? AND lake_id = ? AND event_id IS NOT NULL
          UNION
          SELECT DISTINCT c.find_id, c.event_id FROM catches c JOIN finds f ON f.id = c.find_id WHERE c.crew_id = ? AND f.lake_id = ?
        ) p
        LEFT JOIN catches c ON c.find_id = p.find_id AND c.event_id = p.event_id
       GROUP BY p.find_id, p.event_id
    ) x JOIN finds f ON f.id = x.find_id
   GROUP BY x.event_id, f.kind`;

@Controller('crews/:crewId/bench')
@CrewRoute()
class BenchController {
  constructor(private readonly em: EntityManager) {}

  private async adHoc(crewId: string, lakeId: string) {
    return (await this.em.execute(AD_HOC_BY_KIND, [crewId, lakeId, crewId, lakeId])) as Record<string, unknown>[];
  }

  @Get('ad-hoc/hit-rates')
  async adHocHitRates(@Param('crewId') crewId: string, @Query('lakeId') lakeId: string) {
    const rows = await this.adHoc(crewId, lakeId);
    const byKind = new Map<string, { successes: number; trials: number; fish: number }>();
    for (const r of rows) {
      const g = byKind.get(String(r.kind)) ?? { successes: 0, trials: 0, fish: 0 };
      g.successes += Number(r.producing);
      g.trials += Number(r.finds);
      g.fish += Number(r.fish);
      byKind.set(String(r.kind), g);
    }
    const groups = [...byKind.entries()];
    const rates = groupRates(groups.map(([, g]) => g));
    const rank = ranks(rates);
    return groups.map(([key, g], i) => ({ key, fishCount: g.fish, producing: rates[i], rank: rank[i] }));
  }

  @Get('ad-hoc/lake-comparison')
  async adHocLakeComparison(@Param('crewId') crewId: string, @Query('lakeId') lakeId: string) {
    const rows = await this.adHoc(crewId, lakeId);
    const eventRows = (await this.em.execute(
      'SELECT id FROM events WHERE crew_id = ? AND lake_id = ? ORDER BY JSON_VALUE(competition_dates, "$[0]")',
      [crewId, lakeId],
    )) as { id: string }[];
    const cell = new Map(
      rows.map((r) => [
        `${String(r.event_id)}|${String(r.kind)}`,
        { successes: Number(r.producing), trials: Number(r.finds) },
      ]),
    );
    const kinds = [...new Set(rows.map((r) => String(r.kind)))];
    const comparisons = [];
    for (const k of kinds)
      for (let i = 1; i < eventRows.length; i++) {
        const a = cell.get(`${eventRows[i]!.id}|${k}`) ?? { successes: 0, trials: 0 };
        const b = cell.get(`${eventRows[i - 1]!.id}|${k}`) ?? { successes: 0, trials: 0 };
        comparisons.push({ key: k, ...compareProportions(a, b) });
      }
    return { comparisons };
  }

  @Get('bare-select')
  async bareSelect(@Param('crewId') crewId: string, @Query('lakeId') lakeId: string) {
    return this.em.execute("SELECT * FROM rm_group_stats WHERE crew_id = ? AND lake_id = ? AND grouping = 'kind'", [
      crewId,
      lakeId,
    ]);
  }

  @Post('bare-write')
  @HttpCode(201)
  bareWrite() {
    return { ok: true };
  }
}

@Module({ controllers: [BenchController] })
export class BenchModule {}
