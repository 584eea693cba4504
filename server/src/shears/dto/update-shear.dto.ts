import { ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { SHEAR_STATUSES, type ShearStatus } from '@keenroute/shared';
import { IsIn, IsOptional } from 'class-validator';
import { CreateShearDto } from './create-shear.dto';

// Every field may be left out (unchanged); the service refuses null for the ones a shear always has.
export class UpdateShearDto extends PartialType(CreateShearDto) {
  @ApiPropertyOptional({ enum: SHEAR_STATUSES })
  @IsOptional()
  @IsIn(SHEAR_STATUSES, { message: `Choose a status: ${SHEAR_STATUSES.join(', ')}.` })
  status?: ShearStatus;
}
