import { DomainError } from '../common/errors/domain-error';
import type { GeocodeResultDto } from '../geocoding/dto/geocode-result.dto';
import type { CreateStopDto } from './dto/create-stop.dto';
import type { StopGeocodingDto } from './dto/stop-response.dto';
import type { UpdateStopDto } from './dto/update-stop.dto';
import type { GeocodeStatus, Stop } from './entities/stop.entity';

export interface StopAddress {
  street: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
}

/** The pin a save leaves on the stop, and what to tell the person about it. */
export interface Placement {
  columns?: { latitude: number | null; longitude: number | null; geocodeStatus: GeocodeStatus };
  geocoding: StopGeocodingDto;
}

/** What a save must do about the pin before anything is written. */
export type PlacementPlan = { kind: 'settled'; placement: Placement } | { kind: 'look-up'; query: string };

const nothingToSay = (status: StopGeocodingDto['status']): StopGeocodingDto => ({
  status,
  message: null,
  candidates: [],
});

/** The free-text form geocoders read: "104 Alder Row, Larkhaven, Lakeshore 55901, US". */
export function addressQuery(address: StopAddress): string {
  const regionLine = [address.region, address.postalCode].filter(Boolean).join(' ');
  return [address.street, address.city, regionLine, address.country].filter(Boolean).join(', ');
}

const sameText = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

export function addressChanged(before: StopAddress, after: StopAddress): boolean {
  return (['street', 'city', 'region', 'postalCode', 'country'] as const).some(
    (key) => !sameText(before[key], after[key]),
  );
}

/**
 * Coordinates in the body win ('manual', or 'picked' from the candidates); on an edit, both null clear the pin
 * ('none'); otherwise a new or changed address is looked up, and an unchanged one keeps its pin.
 */
export function planPlacement(
  dto: CreateStopDto | UpdateStopDto,
  address: StopAddress,
  existing?: Stop,
): PlacementPlan {
  const { latitude, longitude } = dto;
  const hasCoordinates = typeof latitude === 'number' && typeof longitude === 'number';
  if (dto.geocodeChoice && !hasCoordinates) {
    throw new DomainError('invalid_input', 'Some fields need attention.', {
      geocodeChoice: ['geocodeChoice goes with latitude and longitude.'],
    });
  }
  if (hasCoordinates) {
    const status = dto.geocodeChoice ?? 'manual';
    return {
      kind: 'settled',
      placement: { columns: { latitude, longitude, geocodeStatus: status }, geocoding: nothingToSay(status) },
    };
  }
  if (existing && latitude === null) {
    return {
      kind: 'settled',
      placement: {
        columns: { latitude: null, longitude: null, geocodeStatus: 'none' },
        geocoding: nothingToSay('none'),
      },
    };
  }
  if (!existing || addressChanged(existing, address)) return { kind: 'look-up', query: addressQuery(address) };
  return { kind: 'settled', placement: { geocoding: nothingToSay('unchanged') } };
}

/** One candidate places the pin; several or none leave the stop without one (an old pin would be for the old address). */
export function placementFrom(result: GeocodeResultDto): Placement {
  const geocoding: StopGeocodingDto = { ...result };
  const [only] = result.candidates;
  if (result.status === 'found' && only) {
    return { columns: { latitude: only.latitude, longitude: only.longitude, geocodeStatus: 'found' }, geocoding };
  }
  const status = result.status === 'ambiguous' ? 'ambiguous' : 'failed';
  return { columns: { latitude: null, longitude: null, geocodeStatus: status }, geocoding };
}
