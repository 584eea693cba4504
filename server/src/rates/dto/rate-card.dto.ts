import { ApiProperty } from '@nestjs/swagger';
import type { RateCard } from '@keenroute/shared';
import { IsObject } from 'class-validator';
import type { RateCardVersion } from '../entities/rate-card-version.entity';

export class UpdateRateCardDto {
  // The card's shape and bounds are the shared package's rules (validateRateCard), checked in the service.
  @ApiProperty({ description: 'The whole rate card, amounts in integer cents' })
  @IsObject({ message: 'Send the whole rate card.' })
  card: RateCard;
}

export class RateCardResponseDto {
  @ApiProperty({ nullable: true, type: Number, description: 'null while no card has been saved' })
  version: number | null;
  @ApiProperty() card: RateCard;
  @ApiProperty({ nullable: true, type: String }) savedAt: string | null;
}

export const toRateCardResponse = (row: RateCardVersion): RateCardResponseDto => ({
  version: row.version,
  card: row.card,
  savedAt: row.createdAt.toISOString(),
});
