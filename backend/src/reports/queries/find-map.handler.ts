import { EntityManager } from '@mikro-orm/mariadb';
import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { MEAN_EARTH_RADIUS_M } from '@shoalbook/analytics';
import type { FindKind, FindMapView } from '@shoalbook/shared';
import { fromMicroLb } from '../../projections/rows';
import { outcomeOf } from '../outcome';
import { eventWhere, findLake } from '../report-events';
import { GetFindMapQuery } from './find-map.query';

const RAD = Math.PI / 180;

/**
 * Metres east and north of the reference point (equirectangular projection with the mean Earth radius): within
 * a lake's few kilometres the error is far below a boat length.
 */
export function localMetres(lat: number, lon: number, refLat: number, refLon: number): { xM: number; yM: number } {
  return {
    xM: (lon - refLon) * RAD * MEAN_EARTH_RADIUS_M * Math.cos(refLat * RAD),
    yM: (lat - refLat) * RAD * MEAN_EARTH_RADIUS_M,
  };
}

const round1 = (x: number) => Math.round(x * 10) / 10;

@QueryHandler(GetFindMapQuery)
export class GetFindMapHandler implements IQueryHandler<GetFindMapQuery, FindMapView | null> {
  constructor(private readonly em: EntityManager) {}

  async execute({ crewId, lakeId, filters, showPositions }: GetFindMapQuery): Promise<FindMapView | null> {
    const lake = await findLake(this.em, crewId, lakeId);
    if (!lake) return null;
    const where = eventWhere(crewId, { ...filters, lakeId });
    const eventScope = `SELECT e.id FROM rm_event e WHERE ${where.sql}`;
    const eventFiltered = !!(filters.eventId || filters.season || filters.year || filters.from || filters.to);
    // Finds of the lake (with an event filter: those fished in the selected events), outcomes summed over them.
    const finds: Record<string, unknown>[] = await this.em.execute(
      `SELECT f.id, f.name, f.kind, f.lat, f.lon, COALESCE(SUM(o.fished), 0) AS fished, COALESCE(SUM(o.fish_count), 0) AS fish_count,
              COALESCE(SUM(o.weighed_count), 0) AS weighed_count, COALESCE(SUM(o.weight_ulb), 0) AS weight_ulb
         FROM rm_find f LEFT JOIN rm_find_outcome o ON o.find_id = f.id AND o.crew_id = f.crew_id AND o.event_id IN (${eventScope})
        WHERE f.crew_id = ? AND f.lake_id = ?
        GROUP BY f.id, f.name, f.kind, f.lat, f.lon
        ${eventFiltered ? 'HAVING COUNT(o.event_id) > 0' : ''}
        ORDER BY f.name`,
      [...where.params, crewId, lakeId],
    );
    const positions = new Map<string, { lat: number; lon: number }>();
    const place = (lat: number | null, lon: number | null) =>
      showPositions && lat !== null && lon !== null ? localMetres(lat, lon, lake.lat, lake.lon) : null;
    const findViews = finds.map((f) => {
      positions.set(String(f.id), { lat: Number(f.lat), lon: Number(f.lon) });
      const p = place(Number(f.lat), Number(f.lon));
      return {
        findId: String(f.id),
        name: String(f.name),
        xM: p ? round1(p.xM) : null,
        yM: p ? round1(p.yM) : null,
        kind: String(f.kind) as FindKind,
        outcome: outcomeOf({
          fished: Number(f.fished) > 0,
          fishCount: Number(f.fish_count),
          weighedCount: Number(f.weighed_count),
        }),
        fishCount: Number(f.fish_count),
        weightLb: fromMicroLb(Number(f.weight_ulb)),
      };
    });
    const catches: Record<string, unknown>[] = await this.em.execute(
      `SELECT c.id, c.find_id, c.lat, c.lon, c.weight_lb FROM rm_catch_fact c WHERE c.crew_id = ? AND c.lake_id = ? AND c.event_id IN (${eventScope}) ORDER BY c.caught_at LIMIT 20000`,
      [crewId, lakeId, ...where.params],
    );
    return {
      lake: { id: lake.id, name: lake.name, lat: lake.lat, lon: lake.lon },
      positionsHidden: !showPositions,
      finds: findViews,
      catches: catches.map((c) => {
        // A catch without its own position is drawn at its find.
        const own =
          c.lat !== null && c.lon !== null
            ? { lat: Number(c.lat), lon: Number(c.lon) }
            : c.find_id
              ? positions.get(String(c.find_id))
              : undefined;
        const p = own ? place(own.lat, own.lon) : null;
        return {
          catchId: String(c.id),
          findId: (c.find_id as string | null) ?? null,
          xM: p ? round1(p.xM) : null,
          yM: p ? round1(p.yM) : null,
          weightLb: Number(c.weight_lb),
        };
      }),
    };
  }
}
