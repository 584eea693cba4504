import { ApiProperty } from '@nestjs/swagger';

/** Another record as a list or detail names it: its id and its name. */
export class RefDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
}

export const refOrNull = (id: string | null, name: string | null): RefDto | null =>
  id === null || name === null ? null : { id, name };
