import { describe, expect, it } from 'vitest';
import { EARTH_RADIUS_KM, fitToBox, haversineKm, projectKm, roundScaleKm, scaleBar } from './projection';

const distanceBetween = (a: { x: number; y: number }, b: { x: number; y: number }) => Math.hypot(a.x - b.x, a.y - b.y);

describe('haversineKm', () => {
  // With R = 6371.0088 km (IUGG mean Earth radius) a degree along a meridian is 2πR / 360 = 111.195 km.
  it('measures one degree along a meridian as 2πR / 360', () => {
    expect(haversineKm({ latitude: 45, longitude: 10 }, { latitude: 46, longitude: 10 })).toBeCloseTo(
      (2 * Math.PI * EARTH_RADIUS_KM) / 360,
      6,
    );
  });

  // Along a parallel a degree shrinks by cos(latitude); at 60° it is half the equator's.
  it('measures a short step along the 60th parallel as half of one on the equator', () => {
    const atEquator = haversineKm({ latitude: 0, longitude: 0 }, { latitude: 0, longitude: 0.01 });
    const atSixty = haversineKm({ latitude: 60, longitude: 0 }, { latitude: 60, longitude: 0.01 });
    expect(atSixty / atEquator).toBeCloseTo(0.5, 4);
  });

  it('is zero for one place and the same both ways', () => {
    const a = { latitude: 45.52, longitude: -122.68 };
    const b = { latitude: 45.49, longitude: -122.61 };
    expect(haversineKm(a, a)).toBe(0);
    expect(haversineKm(a, b)).toBeCloseTo(haversineKm(b, a), 12);
  });
});

describe('projectKm and fitToBox', () => {
  // Invented places around a city at 45.5° N, a few km apart, as a route day spans.
  const places = [
    { latitude: 45.52, longitude: -122.68 },
    { latitude: 45.49, longitude: -122.61 },
    { latitude: 45.55, longitude: -122.64 },
    { latitude: 45.5, longitude: -122.7 },
  ];

  it('keeps distances within half a percent of the haversine distance at a route day’s size', () => {
    const projected = projectKm(places);
    for (let i = 0; i < places.length; i += 1) {
      for (let j = i + 1; j < places.length; j += 1) {
        const flat = distanceBetween(projected[i]!, projected[j]!);
        const round = haversineKm(places[i]!, places[j]!);
        expect(Math.abs(flat - round) / round).toBeLessThan(0.005);
      }
    }
  });

  it('puts north up and east right', () => {
    const [west, east] = projectKm([
      { latitude: 45.5, longitude: -122.7 },
      { latitude: 45.6, longitude: -122.6 },
    ]);
    expect(east!.x).toBeGreaterThan(west!.x);
    expect(east!.y).toBeLessThan(west!.y);
  });

  it('fits every place inside the box with its padding, at one scale both ways', () => {
    const fitted = fitToBox(projectKm(places), 320, 200, 16);
    for (const point of fitted.points) {
      expect(point.x).toBeGreaterThanOrEqual(16 - 1e-9);
      expect(point.x).toBeLessThanOrEqual(320 - 16 + 1e-9);
      expect(point.y).toBeGreaterThanOrEqual(16 - 1e-9);
      expect(point.y).toBeLessThanOrEqual(200 - 16 + 1e-9);
    }
    // Map units between two places, read back through unitsPerKm, give the haversine distance.
    const units = distanceBetween(fitted.points[0]!, fitted.points[1]!);
    const km = haversineKm(places[0]!, places[1]!);
    expect(units / fitted.unitsPerKm / km).toBeCloseTo(1, 2);
  });

  it('centres a lone place', () => {
    const fitted = fitToBox(projectKm([places[0]!]), 300, 200, 10);
    expect(fitted.points[0]).toEqual({ x: 150, y: 100 });
    expect(fitted.unitsPerKm).toBeGreaterThan(0);
  });
});

describe('the scale bar', () => {
  it.each([
    [0.7, 0.5],
    [1, 1],
    [1.9, 1],
    [2, 2],
    [4.99, 2],
    [7, 5],
    [10, 10],
    [19, 10],
    [34, 20],
    [99, 50],
  ])('takes the round length under %s km as %s km', (max, round) => {
    expect(roundScaleKm(max)).toBe(round);
  });

  it('draws its length in map units for the round km figure', () => {
    const bar = scaleBar(40, 100);
    expect(bar).toEqual({ km: 2, length: 80, label: '2 km' });
    expect(scaleBar(400, 100).label).toBe('200 m');
  });

  it('matches the haversine distance between two places on the fitted map', () => {
    const a = { latitude: 45.5, longitude: -122.7 };
    const b = { latitude: 45.5, longitude: -122.6 };
    const fitted = fitToBox(projectKm([a, b]), 400, 200, 20);
    const bar = scaleBar(fitted.unitsPerKm, 120);
    const unitsBetween = distanceBetween(fitted.points[0]!, fitted.points[1]!);
    // The bar's km per unit, applied to the drawn distance, gives the real distance within a percent.
    expect(((unitsBetween / bar.length) * bar.km) / haversineKm(a, b)).toBeCloseTo(1, 2);
  });
});
