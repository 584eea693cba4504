import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '@keenroute/shared';
import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsString, Length, Matches, MaxLength } from 'class-validator';
import { normalisedEmail } from '../../auth/dto/login.dto';

export const trimmed = ({ value }: { value: unknown }): unknown => (typeof value === 'string' ? value.trim() : value);

export class InviteUserDto {
  @ApiProperty({ example: 'new.sharpener@demo.keenroute.test' })
  @Transform(normalisedEmail)
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'Robin Vale' })
  @Transform(trimmed)
  @IsString()
  @Length(1, 120, { message: 'Enter a name of 1 to 120 characters.' })
  @Matches(/^[^\r\n<>]*$/, { message: 'A name cannot contain line breaks or angle brackets.' })
  name: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `Choose one of: ${ROLES.join(', ')}.` })
  role: Role;
}
