import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsOptional, IsUUID } from 'class-validator';

/** Most labels one PDF carries: ten sheets of thirty. */
export const LABELS_MAX = 300;

/** "a,b" and repeated ?ids= both become one list; anything that is not text is left for the validators to refuse. */
const commaList = ({ value }: { value: unknown }): unknown => {
  const parts: unknown[] = Array.isArray(value) ? (value as unknown[]) : [value];
  return parts
    .flatMap((part): unknown[] => (typeof part === 'string' ? part.split(',').map((id) => id.trim()) : [part]))
    .filter((part) => part !== '');
};

export class LabelsQueryDto {
  @ApiPropertyOptional({ description: 'Shear ids, comma-separated', example: 'uuid,uuid' })
  @IsOptional()
  @Transform(commaList)
  @IsArray()
  @ArrayMinSize(1, { message: 'Give at least one shear id.' })
  @ArrayMaxSize(LABELS_MAX, { message: `At most ${LABELS_MAX} labels at a time.` })
  @IsUUID('all', { each: true, message: 'ids must be shear ids separated by commas.' })
  ids?: string[];

  @ApiPropertyOptional({ format: 'uuid', description: 'Every in-service shear of this customer' })
  @IsOptional()
  @IsUUID('all', { message: 'customerId must be a customer id.' })
  customerId?: string;

  @ApiPropertyOptional({ format: 'uuid', description: "Every in-service shear of this stop's customers" })
  @IsOptional()
  @IsUUID('all', { message: 'stopId must be a stop id.' })
  stopId?: string;
}
