/**
 * Flat map arithmetic for one route day's small SVG map: no tiles, just the places.
 * Distances: haversine formula, R = 6371.0088 km (IUGG mean Earth radius, R1).
 * Projection: equirectangular around the day's mean latitude (x scaled by cos φ0), true to scale near the middle,
 * which is plenty for the few kilometres a route day spans.
 */
export const EARTH_RADIUS_KM = 6371.0088;

export interface LatLng {
  latitude: number;
  longitude: number;
}

export interface Point {
  x: number;
  y: number;
}

const toRadians = (degrees: number) => (degrees * Math.PI) / 180;

/** Great-circle distance in km between two places (haversine formula). */
export function haversineKm(a: LatLng, b: LatLng): number {
  const dLat = toRadians(b.latitude - a.latitude);
  const dLng = toRadians(b.longitude - a.longitude);
  const h =
    Math.sin(dLat / 2) ** 2 +
    Math.cos(toRadians(a.latitude)) * Math.cos(toRadians(b.latitude)) * Math.sin(dLng / 2) ** 2;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}

/** Places in km on a plane, north up (SVG y grows downwards, so y is minus the northing). */
export function projectKm(places: readonly LatLng[]): Point[] {
  if (places.length === 0) return [];
  const meanLatitude = places.reduce((sum, place) => sum + place.latitude, 0) / places.length;
  const cosine = Math.cos(toRadians(meanLatitude));
  return places.map((place) => ({
    x: EARTH_RADIUS_KM * toRadians(place.longitude) * cosine,
    y: -EARTH_RADIUS_KM * toRadians(place.latitude),
  }));
}

export interface Fitted {
  points: Point[];
  /** SVG units per km, the same across and down. */
  unitsPerKm: number;
}

// A lone place (or places on one spot) still gets a sensible zoom: as if the map spanned this much.
const MIN_SPAN_KM = 1;

/** Scales and centres km points into a width × height box, keeping the aspect and a padding on every side. */
export function fitToBox(points: readonly Point[], width: number, height: number, padding: number): Fitted {
  if (points.length === 0) return { points: [], unitsPerKm: 1 };
  const xs = points.map((point) => point.x);
  const ys = points.map((point) => point.y);
  const minX = Math.min(...xs);
  const minY = Math.min(...ys);
  const spanX = Math.max(Math.max(...xs) - minX, MIN_SPAN_KM);
  const spanY = Math.max(Math.max(...ys) - minY, MIN_SPAN_KM);
  const unitsPerKm = Math.min((width - 2 * padding) / spanX, (height - 2 * padding) / spanY);
  const offsetX = (width - (Math.max(...xs) - minX) * unitsPerKm) / 2;
  const offsetY = (height - (Math.max(...ys) - minY) * unitsPerKm) / 2;
  return {
    points: points.map((point) => ({
      x: offsetX + (point.x - minX) * unitsPerKm,
      y: offsetY + (point.y - minY) * unitsPerKm,
    })),
    unitsPerKm,
  };
}

const STEPS = [1, 2, 5];

/** The largest round length (…0.5, 1, 2, 5, 10, 20… km) that is no longer than maxKm. */
export function roundScaleKm(maxKm: number): number {
  if (!(maxKm > 0) || !Number.isFinite(maxKm)) return 0;
  let magnitude = 10 ** Math.floor(Math.log10(maxKm));
  for (;;) {
    for (let index = STEPS.length - 1; index >= 0; index -= 1) {
      const candidate = (STEPS[index] ?? 1) * magnitude;
      // A hair of tolerance so 10 km is not read as 9.999… on floating point.
      if (candidate <= maxKm * (1 + 1e-9)) return Number(candidate.toPrecision(1));
    }
    magnitude /= 10;
  }
}

export interface ScaleBar {
  km: number;
  length: number;
  label: string;
}

/** A scale bar of a round km figure, at most maxLength SVG units long. */
export function scaleBar(unitsPerKm: number, maxLength: number): ScaleBar {
  const km = roundScaleKm(maxLength / unitsPerKm);
  return { km, length: km * unitsPerKm, label: km >= 1 ? `${km} km` : `${Math.round(km * 1000)} m` };
}
