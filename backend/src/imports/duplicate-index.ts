import { distanceM } from '@shoalbook/analytics';

/** A point the index holds: an existing find, or an earlier row of the same file. */
export interface IndexedPoint {
  lat: number;
  lon: number;
  name: string;
  findId: string | null;
  rowIndex: number | null;
}

const M_PER_DEG_LAT = 111_195; // mean Earth radius 6,371,008.8 m × π/180, rounded down (cells a bit larger: safe)

/**
 * Finds points within `radiusM` of a point quickly: a grid of cells at least `radiusM` wide, so only the
 * 3 × 3 neighbouring cells need the exact great-circle check (analytics distanceM). Checking 10,000
 * waypoints against 10,000 finds pairwise would be 10⁸ distance computations; this is ~10⁵.
 */
export class DuplicateIndex {
  private readonly cells = new Map<string, IndexedPoint[]>();
  private readonly latStep: number;
  private readonly lonStep: number;

  /** `refLat`: a latitude near the points (the lake's), which sets the longitude cell width. */
  constructor(
    private readonly radiusM: number,
    refLat: number,
  ) {
    this.latStep = radiusM / M_PER_DEG_LAT;
    // Cells are widened for the most poleward latitude the lake could plausibly span (±1°).
    const cos = Math.cos((Math.min(89, Math.abs(refLat) + 1) * Math.PI) / 180);
    this.lonStep = this.latStep / Math.max(cos, 0.01);
  }

  private key(i: number, j: number): string {
    return `${i}:${j}`;
  }

  add(p: IndexedPoint): void {
    const k = this.key(Math.floor(p.lat / this.latStep), Math.floor(p.lon / this.lonStep));
    const list = this.cells.get(k);
    if (list) list.push(p);
    else this.cells.set(k, [p]);
  }

  /** The nearest indexed point within the radius, or null. */
  nearest(lat: number, lon: number): { point: IndexedPoint; distanceM: number } | null {
    const i0 = Math.floor(lat / this.latStep);
    const j0 = Math.floor(lon / this.lonStep);
    let best: { point: IndexedPoint; distanceM: number } | null = null;
    for (let i = i0 - 1; i <= i0 + 1; i++) {
      for (let j = j0 - 1; j <= j0 + 1; j++) {
        for (const p of this.cells.get(this.key(i, j)) ?? []) {
          const d = distanceM({ lat, lon }, p);
          if (d <= this.radiusM && (!best || d < best.distanceM)) best = { point: p, distanceM: d };
        }
      }
    }
    return best;
  }
}
