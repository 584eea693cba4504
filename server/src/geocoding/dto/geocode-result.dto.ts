import { ApiProperty } from '@nestjs/swagger';

export const GEOCODE_SEARCH_STATUSES = ['found', 'ambiguous', 'failed'] as const;
export type GeocodeSearchStatus = (typeof GEOCODE_SEARCH_STATUSES)[number];

export class GeocodeCandidateDto {
  @ApiProperty({ example: '104 Alder Row, Larkhaven, Lakeshore 55901, US' }) label: string;
  @ApiProperty({ example: 44.8243 }) latitude: number;
  @ApiProperty({ example: -92.417 }) longitude: number;
}

/** What one look-up found: exactly one place, several to choose from, or nothing (including a geocoder that is down). */
export class GeocodeResultDto {
  @ApiProperty({ enum: GEOCODE_SEARCH_STATUSES }) status: GeocodeSearchStatus;
  @ApiProperty({ nullable: true, type: String, description: 'What to do next, for ambiguous and failed look-ups' })
  message: string | null;
  @ApiProperty({ type: [GeocodeCandidateDto] }) candidates: GeocodeCandidateDto[];
}
