import { ApiProperty } from '@nestjs/swagger';
import { IsString, Length } from 'class-validator';

export class SetPasswordDto {
  @ApiProperty({ description: 'The secret from the invitation or reset link' })
  @IsString()
  @Length(20, 200, { message: 'This link is not complete. Open it again from the e-mail.' })
  token: string;

  // Length and common-password rules are checked by the password policy, with messages for people.
  @ApiProperty({ minLength: 10 })
  @IsString({ message: 'Enter a password.' })
  @Length(1, 1000, { message: 'Enter a password.' })
  password: string;
}
