import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsString, Length } from 'class-validator';

export class GeocodeSearchQueryDto {
  @ApiProperty({ description: 'A free-text address', example: '104 Alder Row, Larkhaven' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'Enter an address to look up.' })
  @Length(3, 300, { message: 'Enter an address of 3 to 300 characters to look up.' })
  q: string;
}
