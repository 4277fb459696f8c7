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

/** The find columns attribution and naming need, and the reference made from them. */
const FIND_FIELDS = ['id', 'name', 'lat', 'lon'] as const;
const refOf = (f: Pick<Find, (typeof FIND_FIELDS)[number]>): FindRef => ({
  id: f.id,
  name: f.name,
  lat: f.lat,
  lon: f.lon,
});

/** A lookup over finds already in memory, which also hands out the whole list (an import matches finds by name). */
export interface FindsInMemory extends FindLookup {
  readonly all: readonly FindRef[];
}

/** For a batch (an import checks thousands of rows): every find of the lake, loaded once. */
export function findsInMemory(finds: readonly FindRef[]): FindsInMemory {
  const byId = new Map(finds.map((f) => [f.id, f]));
  return {
    all: finds,
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

/** Every find of the lake, read once, as an in-memory lookup (in id order, so ties in attribution are stable). */
export async function loadLakeFinds(em: EntityManager, crewId: string, lakeId: string): Promise<FindsInMemory> {
  const found = await em.find(Find, { crewId, lakeId }, { fields: [...FIND_FIELDS], orderBy: { id: 'asc' } });
  return findsInMemory(found.map(refOf));
}

/**
 * For one catch: ask the database for the find or for the box around the point, so logging a catch
 * costs the same on a lake with twenty finds as on one with twenty thousand.
 */
export function findsInDatabase(em: EntityManager, crewId: string, lakeId: string): FindLookup {
  // A command asks for the same find twice (to check it, then to name it in the view); read it once.
  const seen = new Map<string, FindRef | undefined>();
  return {
    byId: async (id) => {
      if (!seen.has(id)) {
        const f = await em.findOne(Find, { id, crewId, lakeId }, { fields: [...FIND_FIELDS] });
        seen.set(id, f ? refOf(f) : undefined);
      }
      return seen.get(id);
    },
    near: async (point, radiusM) => {
      const b = boundingBox(point, radiusM);
      const lon = b.minLon === undefined ? {} : { lon: { $gte: b.minLon, $lte: b.maxLon! } };
      const finds = await em.find(
        Find,
        { crewId, lakeId, lat: { $gte: b.minLat, $lte: b.maxLat }, ...lon },
        { fields: [...FIND_FIELDS], orderBy: { id: 'asc' } },
      );
      const refs = finds.map(refOf);
      for (const f of refs) seen.set(f.id, f);
      return refs;
    },
  };
}
