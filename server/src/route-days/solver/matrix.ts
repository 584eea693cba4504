import type { TravelMatrix } from './types';

/** A matrix whose drive minutes and distances are precomputed into flat arrays (row-major). */
class DenseMatrix implements TravelMatrix {
  constructor(
    readonly size: number,
    private readonly dist: Float64Array,
    private readonly mins: Float64Array,
  ) {}

  minutes(from: number, to: number): number {
    return this.mins[from * this.size + to]!;
  }

  distance(from: number, to: number): number {
    return this.dist[from * this.size + to]!;
  }
}

const EARTH_RADIUS_KM = 6371.0088;

/** Haversine distance in km between two points given in degrees. */
export function haversineKm(a: { lat: number; lon: number }, b: { lat: number; lon: number }): number {
  const rad = Math.PI / 180;
  const dLat = (b.lat - a.lat) * rad;
  const dLon = (b.lon - a.lon) * rad;
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(a.lat * rad) * Math.cos(b.lat * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}

/** Road estimate without a road network: great-circle km times a circuity factor, driven at a flat speed. */
export function greatCircleMatrix(
  points: { lat: number; lon: number }[],
  options: { circuity?: number; speedKmh?: number } = {},
): TravelMatrix {
  const circuity = options.circuity ?? 1.3;
  const speedKmh = options.speedKmh ?? 40;
  const n = points.length;
  const dist = new Float64Array(n * n);
  const mins = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const km = i === j ? 0 : haversineKm(points[i]!, points[j]!) * circuity;
      dist[i * n + j] = km;
      mins[i * n + j] = (km / speedKmh) * 60;
    }
  }
  return new DenseMatrix(n, dist, mins);
}

/** Plane distances: 'nint' is TSPLIB EUC_2D (floor(d + 0.5)); 'none' is Solomon's unrounded. Minutes = distance. */
export function euclideanMatrix(points: { x: number; y: number }[], options: { round: 'nint' | 'none' }): TravelMatrix {
  const n = points.length;
  const dist = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const d = Math.hypot(points[i]!.x - points[j]!.x, points[i]!.y - points[j]!.y);
      dist[i * n + j] = options.round === 'nint' ? Math.floor(d + 0.5) : d;
    }
  }
  return new DenseMatrix(n, dist, dist);
}

/** Plain travel tables, row-major by place: what crosses a worker-thread boundary (structured-clone friendly). */
export interface MatrixArrays {
  minutes: number[][];
  distance: number[][];
}

/** Builds a TravelMatrix from plain arrays (e.g. received in a worker thread); refuses ragged or non-finite tables. */
export function matrixFromArrays(arrays: MatrixArrays): TravelMatrix {
  const n = arrays.minutes.length;
  if (arrays.distance.length !== n)
    throw new Error(`matrix: ${n} minute rows but ${arrays.distance.length} distance rows`);
  const dist = new Float64Array(n * n);
  const mins = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const mRow = arrays.minutes[i]!;
    const dRow = arrays.distance[i]!;
    if (mRow.length !== n || dRow.length !== n) throw new Error(`matrix: row ${i} is not ${n} long`);
    for (let j = 0; j < n; j++) {
      const m = mRow[j]!;
      const d = dRow[j]!;
      if (!Number.isFinite(m) || !Number.isFinite(d) || m < 0 || d < 0) {
        throw new Error(`matrix: entry ${i},${j} must be a finite non-negative number`);
      }
      mins[i * n + j] = m;
      dist[i * n + j] = d;
    }
  }
  return new DenseMatrix(n, dist, mins);
}

/** The plain arrays of any TravelMatrix, to send it to a worker thread. */
export function matrixToArrays(matrix: TravelMatrix): MatrixArrays {
  const rows = (f: (i: number, j: number) => number): number[][] =>
    Array.from({ length: matrix.size }, (_, i) => Array.from({ length: matrix.size }, (_, j) => f(i, j)));
  return { minutes: rows((i, j) => matrix.minutes(i, j)), distance: rows((i, j) => matrix.distance(i, j)) };
}
