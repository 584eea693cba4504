/**
 * TSPLIB reading for the route benchmark (G. Reinelt, ORSA Journal on Computing 3(4), 1991): EUC_2D instances and
 * their .opt.tour files. Pure functions over file text; the caller reads the file.
 */

export interface Point {
  x: number;
  y: number;
}

export interface TsplibInstance {
  name: string;
  dimension: number;
  /** coords[i] is node i + 1 (TSPLIB numbers nodes from 1). */
  coords: Point[];
}

const HEADER = /^([A-Z_]+)\s*:\s*(.*)$/;

/** Splits a file into "KEY : value" header entries and the lines of the section that follows `sectionName`. */
function splitFile(text: string, sectionName: string): { header: Map<string, string>; section: string[] } {
  const header = new Map<string, string>();
  const section: string[] = [];
  let inSection = false;
  for (const raw of text.split(/\r?\n/)) {
    const line = raw.trim();
    if (line === '' || line === 'EOF') continue;
    if (line === sectionName) {
      inSection = true;
      continue;
    }
    const entry = HEADER.exec(line);
    if (entry) {
      inSection = false;
      header.set(entry[1] ?? '', (entry[2] ?? '').trim());
    } else if (inSection) {
      section.push(line);
    } else if (/^[A-Z_]+$/.test(line)) {
      // Another section this reader does not use (e.g. DISPLAY_DATA_SECTION): skip its lines.
      inSection = false;
    }
  }
  return { header, section };
}

function positiveInt(value: string | undefined, what: string): number {
  const n = Number(value);
  if (!Number.isInteger(n) || n <= 0) throw new Error(`TSPLIB: ${what} must be a positive integer, got "${value}"`);
  return n;
}

export function parseTsplib(text: string): TsplibInstance {
  const { header, section } = splitFile(text, 'NODE_COORD_SECTION');
  const name = header.get('NAME') ?? '';
  const type = header.get('TYPE');
  if (type !== undefined && type !== 'TSP') throw new Error(`TSPLIB: only TYPE TSP is supported, got "${type}"`);
  const weightType = header.get('EDGE_WEIGHT_TYPE');
  if (weightType !== 'EUC_2D') {
    throw new Error(`TSPLIB: only EDGE_WEIGHT_TYPE EUC_2D is supported, got "${weightType ?? '(missing)'}"`);
  }
  const dimension = positiveInt(header.get('DIMENSION'), 'DIMENSION');
  const coords: (Point | undefined)[] = new Array<Point | undefined>(dimension).fill(undefined);
  for (const line of section) {
    const parts = line.split(/\s+/);
    const id = Number(parts[0]);
    const x = Number(parts[1]);
    const y = Number(parts[2]);
    if (parts.length !== 3 || !Number.isInteger(id) || !Number.isFinite(x) || !Number.isFinite(y)) {
      throw new Error(`TSPLIB: bad NODE_COORD_SECTION line "${line}"`);
    }
    if (id < 1 || id > dimension) throw new Error(`TSPLIB: node ${id} is outside 1..${dimension}`);
    if (coords[id - 1]) throw new Error(`TSPLIB: node ${id} is listed twice`);
    coords[id - 1] = { x, y };
  }
  const missing = coords.findIndex((c) => c === undefined);
  if (missing >= 0) throw new Error(`TSPLIB: node ${missing + 1} has no coordinates`);
  return { name, dimension, coords: coords as Point[] };
}

/** Reads a .opt.tour file: node ids (from 1) in tour order, the closing return to the first node implied. */
export function parseTour(text: string): number[] {
  const { header, section } = splitFile(text, 'TOUR_SECTION');
  const tour: number[] = [];
  let ended = false;
  for (const token of section.join(' ').split(/\s+/)) {
    if (token === '') continue;
    const id = Number(token);
    if (!Number.isInteger(id)) throw new Error(`TSPLIB: bad TOUR_SECTION entry "${token}"`);
    if (id === -1) {
      ended = true;
      break;
    }
    tour.push(id);
  }
  if (!ended) throw new Error('TSPLIB: TOUR_SECTION does not end with -1');
  const dimension = header.get('DIMENSION');
  if (dimension !== undefined && positiveInt(dimension, 'DIMENSION') !== tour.length) {
    throw new Error(`TSPLIB: tour lists ${tour.length} nodes but DIMENSION is ${dimension}`);
  }
  return tour;
}

/** TSPLIB's nint: floor(x + 0.5). */
export function nint(x: number): number {
  return Math.floor(x + 0.5);
}

/** EUC_2D distance between two points, rounded as TSPLIB defines it. */
export function euc2d(a: Point, b: Point): number {
  return nint(Math.hypot(a.x - b.x, a.y - b.y));
}

/** True when the tour visits every node 1..n exactly once. */
export function isPermutation(tour: readonly number[], n: number): boolean {
  if (tour.length !== n) return false;
  const seen = new Set(tour);
  return seen.size === n && tour.every((id) => Number.isInteger(id) && id >= 1 && id <= n);
}

/** Length of the closed cycle through `tour` (node ids from 1), each leg rounded with nint. */
export function tourLength(coords: readonly Point[], tour: readonly number[]): number {
  let total = 0;
  for (let i = 0; i < tour.length; i++) {
    const from = coords[(tour[i] ?? 0) - 1];
    const to = coords[(tour[(i + 1) % tour.length] ?? 0) - 1];
    if (!from || !to) throw new Error(`tourLength: node ${tour[i]} or its successor is not in the instance`);
    total += euc2d(from, to);
  }
  return total;
}

/** The baseline: from node 1, always go to the nearest unvisited node (ties: the lower id). */
export function nearestNeighbourTour(coords: readonly Point[]): number[] {
  const n = coords.length;
  if (n === 0) return [];
  const visited = new Array<boolean>(n).fill(false);
  const tour = [1];
  visited[0] = true;
  let current = 0;
  for (let step = 1; step < n; step++) {
    let best = -1;
    let bestDistance = Infinity;
    for (let j = 0; j < n; j++) {
      if (visited[j]) continue;
      const d = euc2d(coords[current] as Point, coords[j] as Point);
      if (d < bestDistance) {
        bestDistance = d;
        best = j;
      }
    }
    visited[best] = true;
    tour.push(best + 1);
    current = best;
  }
  return tour;
}
