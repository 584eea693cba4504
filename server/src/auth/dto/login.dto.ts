import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsString, Length, MaxLength } from 'class-validator';

export const normalisedEmail = ({ value }: { value: unknown }): unknown =>
  typeof value === 'string' ? value.trim().toLowerCase() : value;

export class LoginDto {
  @ApiProperty({ example: 'owner@demo.keenroute.test' })
  @Transform(normalisedEmail)
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'keenroute-demo' })
  @IsString({ message: 'Enter your password.' })
  @Length(1, 200, { message: 'Enter your password.' })
  password: string;
}
