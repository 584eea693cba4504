import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, MaxLength } from 'class-validator';
import { trimmedOrEmpty } from './stop-validators';

const NOTE_MESSAGE = 'A note is text of up to 500 characters.';

/** What a sharpener needs to get in: parking, which door, the best time to arrive. */
export class AccessNotesDto {
  @ApiPropertyOptional({ nullable: true, type: String, example: 'Two spaces behind the building' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: NOTE_MESSAGE })
  @MaxLength(500, { message: NOTE_MESSAGE })
  accessParking?: string;

  @ApiPropertyOptional({ nullable: true, type: String, example: 'Side door, ring twice' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: NOTE_MESSAGE })
  @MaxLength(500, { message: NOTE_MESSAGE })
  accessDoor?: string;

  @ApiPropertyOptional({ nullable: true, type: String, example: 'Before the 10:00 rush' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: NOTE_MESSAGE })
  @MaxLength(500, { message: NOTE_MESSAGE })
  accessBestTime?: string;
}
