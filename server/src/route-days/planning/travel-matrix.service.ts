import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { LRUCache } from 'lru-cache';
import { createHash } from 'node:crypto';
import type { AppConfig } from '../../config/environment';
import { DomainError } from '../../common/errors/domain-error';
import { haversineKm } from '../solver/matrix';

export interface LatLon {
  lat: number;
  lon: number;
}

/** Drive minutes and km between places, as plain arrays: they cross into the solver's worker thread as they are. */
export interface MatrixArrays {
  minutes: number[][];
  km: number[][];
  source: 'great-circle' | 'routing-service';
}

export interface TravelModel {
  circuity: number;
  averageSpeedKmh: number;
}

/** A week's matrices are small (tens of places); a few hundred kept cover every week being planned. */
const CACHE_ENTRIES = 200;
const ROUTING_TIMEOUT_MS = 10_000;

/**
 * Travel between stops: the routing service's `table` matrix when ROUTING_URL is set, else great-circle km times the
 * circuity factor at the average speed. Cached per set of points (and travel model), per API process.
 */
@Injectable()
export class TravelMatrixService {
  private readonly logger = new Logger(TravelMatrixService.name);
  private readonly cache = new LRUCache<string, MatrixArrays>({ max: CACHE_ENTRIES });

  constructor(private readonly config: ConfigService<AppConfig, true>) {}

  async matrix(points: readonly LatLon[], model: TravelModel): Promise<MatrixArrays> {
    const routingUrl = this.config.get('ROUTING_URL', { infer: true });
    const key = cacheKey(points, routingUrl ? { routingUrl } : model);
    const cached = this.cache.get(key);
    if (cached) return cached;
    const matrix = routingUrl ? await this.fromRoutingService(routingUrl, points) : greatCircle(points, model);
    this.cache.set(key, matrix);
    return matrix;
  }

  private async fromRoutingService(base: string, points: readonly LatLon[]): Promise<MatrixArrays> {
    const coordinates = points.map((p) => `${p.lon.toFixed(6)},${p.lat.toFixed(6)}`).join(';');
    const url = new URL(`table/v1/driving/${coordinates}`, base.endsWith('/') ? base : `${base}/`);
    url.search = 'annotations=duration,distance';
    let body: { code?: string; durations?: (number | null)[][]; distances?: (number | null)[][] };
    try {
      const response = await fetch(url, { signal: AbortSignal.timeout(ROUTING_TIMEOUT_MS) });
      body = (await response.json()) as typeof body;
      if (!response.ok || body.code !== 'Ok') throw new Error(`HTTP ${response.status}, code ${body.code}`);
    } catch (error) {
      this.logger.warn(`Routing service table failed: ${(error as Error).message}`);
      throw new DomainError('conflict', 'The routing service did not answer with travel times; try planning again.');
    }
    const n = points.length;
    const durations = body.durations;
    const distances = body.distances;
    if (!isSquare(durations, n) || !isSquare(distances, n)) {
      throw new DomainError('conflict', 'The routing service answered a table of the wrong size; try again.');
    }
    // An unreachable pair (null) is made very long rather than free, so the solver avoids it.
    return {
      minutes: durations.map((row) => row.map((s) => (s === null ? 1e6 : s / 60))),
      km: distances.map((row) => row.map((m) => (m === null ? 1e6 : m / 1000))),
      source: 'routing-service',
    };
  }
}

function isSquare(table: (number | null)[][] | undefined, n: number): table is (number | null)[][] {
  return Array.isArray(table) && table.length === n && table.every((row) => Array.isArray(row) && row.length === n);
}

export function greatCircle(points: readonly LatLon[], model: TravelModel): MatrixArrays {
  const km = points.map((a, i) => points.map((b, j) => (i === j ? 0 : haversineKm(a, b) * model.circuity)));
  return { km, minutes: km.map((row) => row.map((d) => (d / model.averageSpeedKmh) * 60)), source: 'great-circle' };
}

function cacheKey(points: readonly LatLon[], extra: object): string {
  return createHash('sha256')
    .update(JSON.stringify([points.map((p) => [p.lat, p.lon]), extra]))
    .digest('base64url');
}
