import { ApiPropertyOptional } from '@nestjs/swagger';
import { ROLES, type Role } from '@keenroute/shared';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsString, Length, Matches } from 'class-validator';
import { trimmed } from './invite-user.dto';

export class UpdateUserDto {
  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimmed)
  @IsString()
  @Length(1, 120, { message: 'Enter a name of 1 to 120 characters.' })
  @Matches(/^[^\r\n<>]*$/, { message: 'A name cannot contain line breaks or angle brackets.' })
  name?: string;

  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @IsIn(ROLES, { message: `Choose one of: ${ROLES.join(', ')}.` })
  role?: Role;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false.' })
  active?: boolean;
}
