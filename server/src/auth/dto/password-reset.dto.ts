import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, MaxLength } from 'class-validator';
import { normalisedEmail } from './login.dto';

export class PasswordResetDto {
  @ApiProperty()
  @Transform(normalisedEmail)
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  @MaxLength(254)
  email: string;
}
