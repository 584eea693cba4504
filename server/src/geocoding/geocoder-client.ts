import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppConfig } from '../config/environment';
import type { GeocodeCandidateDto, GeocodeResultDto } from './dto/geocode-result.dto';

const PLACE_THE_PIN = 'Enter coordinates to place the pin.';

/** How many places one look-up asks for; more than one already means the address is ambiguous. */
export const GEOCODE_CANDIDATE_LIMIT = 5;

/**
 * Talks to an HTTP geocoder of the usual search form (`GET {GEOCODER_URL}/search?q=...&format=json&limit=N`,
 * answering `[{ lat: "44.8", lon: "-92.4", display_name }]`). It never throws: a geocoder that is missing, slow,
 * down or talking nonsense becomes a 'failed' result whose message says what to do, so saving a stop never fails.
 */
@Injectable()
export class GeocoderClient {
  private readonly logger = new Logger(GeocoderClient.name);
  /** A look-up waits this long before giving up (a form is waiting on it). */
  protected readonly timeoutMs: number = 3000;

  constructor(private readonly config: ConfigService<AppConfig, true>) {}

  async search(query: string): Promise<GeocodeResultDto> {
    const base = this.config.get('GEOCODER_URL', { infer: true });
    if (!base) {
      return failed(`No geocoder is set up (GEOCODER_URL), so addresses are not looked up. ${PLACE_THE_PIN}`);
    }
    const url = new URL('search', base.endsWith('/') ? base : `${base}/`);
    url.search = new URLSearchParams({ q: query, format: 'json', limit: String(GEOCODE_CANDIDATE_LIMIT) }).toString();
    let body: unknown;
    try {
      const response = await fetch(url, {
        headers: { accept: 'application/json', 'user-agent': 'Keenroute (stop geocoding)' },
        signal: AbortSignal.timeout(this.timeoutMs),
      });
      if (!response.ok) {
        this.logger.warn(`Geocoder answered HTTP ${response.status} for a look-up`);
        return failed(`The geocoder refused the look-up (HTTP ${response.status}). ${PLACE_THE_PIN}`);
      }
      body = await response.json();
    } catch (error) {
      // Checked by shape: fetch's errors may come from another realm (jest), where instanceof Error is false.
      const { name, message } = (typeof error === 'object' && error !== null ? error : {}) as Partial<Error>;
      const timedOut = name === 'TimeoutError';
      this.logger.warn(`Geocoder look-up failed: ${message ?? String(error)}`);
      return failed(
        timedOut
          ? `The geocoder did not answer within ${this.timeoutMs / 1000} s. ${PLACE_THE_PIN}`
          : `The geocoder could not be reached. ${PLACE_THE_PIN}`,
      );
    }
    if (!Array.isArray(body)) return failed(`The geocoder sent an answer Keenroute cannot read. ${PLACE_THE_PIN}`);
    const candidates = body.map(toCandidate).filter((c): c is GeocodeCandidateDto => c !== undefined);
    if (candidates.length === 0) return failed(`No place was found for this address. ${PLACE_THE_PIN}`);
    if (candidates.length === 1) return { status: 'found', message: null, candidates };
    return {
      status: 'ambiguous',
      message: `The address matches ${candidates.length} places. Pick one, or enter coordinates to place the pin.`,
      candidates,
    };
  }
}

const failed = (message: string): GeocodeResultDto => ({ status: 'failed', message, candidates: [] });

/** One place from the geocoder's answer; anything without usable coordinates is left out. */
function toCandidate(raw: unknown): GeocodeCandidateDto | undefined {
  if (typeof raw !== 'object' || raw === null) return undefined;
  const { lat, lon, display_name: label } = raw as Record<string, unknown>;
  const latitude = typeof lat === 'string' || typeof lat === 'number' ? Number(lat) : NaN;
  const longitude = typeof lon === 'string' || typeof lon === 'number' ? Number(lon) : NaN;
  if (!Number.isFinite(latitude) || Math.abs(latitude) > 90) return undefined;
  if (!Number.isFinite(longitude) || Math.abs(longitude) > 180) return undefined;
  return {
    label: typeof label === 'string' && label !== '' ? label : `${latitude}, ${longitude}`,
    latitude,
    longitude,
  };
}
