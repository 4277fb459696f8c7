import type { EntityManager } from '@mikro-orm/mariadb';
import { Find } from '../finds/find.entity';

/** A find of the catch's lake, as attribution needs it. */
export interface FindRef {
  id: string;
  name: string;
  lat: number;
  lon: number;
}

/**
 * The lake's finds as checking a catch needs them: one by id, and the candidates near a point (a
 * superset of those within the radius; the caller measures the exact distance).
 */
export interface FindLookup {
  byId(id: string): Promise<FindRef | undefined>;
  near(point: { lat: number; lon: number }, radiusM: number): Promise<FindRef[]>;
}

/** Metres per degree of latitude, rounded down so the box is never too small (mean Earth radius 6,371,008.8 m). */
const METRES_PER_DEGREE = 111_000;
/** A 1 % margin on the box, for the sphere-versus-box rounding. */
const MARGIN = 1.01;

/** The box of latitudes and longitudes that holds every point within `radiusM`; no longitude bound near a pole or the antimeridian. */
export function boundingBox(
  point: { lat: number; lon: number },
  radiusM: number,
): { minLat: number; maxLat: number; minLon?: number; maxLon?: number } {
  const dLat = (radiusM / METRES_PER_DEGREE) * MARGIN;
  const box = { minLat: point.lat - dLat, maxLat: point.lat + dLat };
  const cos = Math.cos((Math.min(89.9, Math.abs(point.lat) + dLat) * Math.PI) / 180);
  const dLon = dLat / cos;
  if (dLon >= 180 || point.lon - dLon < -180 || point.lon + dLon > 180) return box;
  return { ...box, minLon: point.lon - dLon, maxLon: point.lon + dLon };
}

/** For a batch (an import checks thousands of rows): every find of the lake, loaded once. */
export function findsInMemory(finds: readonly FindRef[]): FindLookup {
  const byId = new Map(finds.map((f) => [f.id, f]));
  return {
    byId: (id) => Promise.resolve(byId.get(id)),
    near: (point, radiusM) => {
      const b = boundingBox(point, radiusM);
      return Promise.resolve(
        finds.filter(
          (f) =>
            f.lat >= b.minLat &&
            f.lat <= b.maxLat &&
            (b.minLon === undefined || (f.lon >= b.minLon && f.lon <= b.maxLon!)),
        ),
      );
    },
  };
}

/**
 * For one catch: ask the database for the find or for the box around the point, so logging a catch
 * costs the same on a lake with twenty finds as on one with twenty thousand.
 */
export function findsInDatabase(em: EntityManager, crewId: string, lakeId: string): FindLookup {
  const fields = ['id', 'name', 'lat', 'lon'] as const;
  const ref = (f: Pick<Find, (typeof fields)[number]>): FindRef => ({ id: f.id, name: f.name, lat: f.lat, lon: f.lon });
  // A command asks for the same find twice (to check it, then to name it in the view); read it once.
  const seen = new Map<string, FindRef | undefined>();
  return {
    byId: async (id) => {
      if (!seen.has(id)) {
        const f = await em.findOne(Find, { id, crewId, lakeId }, { fields: [...fields] });
        seen.set(id, f ? ref(f) : undefined);
      }
      return seen.get(id);
    },
    near: async (point, radiusM) => {
      const b = boundingBox(point, radiusM);
      const lon = b.minLon === undefined ? {} : { lon: { $gte: b.minLon, $lte: b.maxLon! } };
      const finds = await em.find(
        Find,
        { crewId, lakeId, lat: { $gte: b.minLat, $lte: b.maxLat }, ...lon },
        { fields: [...fields], orderBy: { id: 'asc' } },
      );
      const refs = finds.map(ref);
      for (const f of refs) seen.set(f.id, f);
      return refs;
    },
  };
}
