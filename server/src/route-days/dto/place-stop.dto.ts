import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsInt, IsOptional, IsUUID, Max, Min } from 'class-validator';
import { PG_INTEGER_MAX } from '../../common/validation/limits';

export class PlaceStopDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'stopId is a stop id.' })
  stopId: string;

  @ApiProperty({ description: '0-based position in the day; past the end means last' })
  @IsInt({ message: 'position is a whole number from 0.' })
  @Min(0, { message: 'position is a whole number from 0.' })
  @Max(200)
  position: number;

  @ApiPropertyOptional({ description: "The day's version as last read; a newer day refuses the change (409)" })
  @IsOptional()
  @IsInt()
  @Max(PG_INTEGER_MAX)
  version?: number;
}

export class LockStopDto {
  @ApiPropertyOptional({ description: 'Keep its position too, not only its day' })
  @IsOptional()
  @IsBoolean()
  keepPosition?: boolean;
}
