import { ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsString, Length, Matches, ValidateIf } from 'class-validator';
import { trimmed } from '../../users/dto/invite-user.dto';
import { CreateCustomerDto, NAME_MESSAGE, SINGLE_LINE } from './create-customer.dto';

export class UpdateCustomerDto extends PartialType(OmitType(CreateCustomerDto, ['name'] as const)) {
  // Left out means unchanged; null is refused because every customer has a name.
  @ApiPropertyOptional({ example: 'Avery Lind' })
  @ValidateIf((_dto: unknown, value: unknown) => value !== undefined)
  @Transform(trimmed)
  @IsString({ message: NAME_MESSAGE })
  @Length(1, 120, { message: NAME_MESSAGE })
  @Matches(SINGLE_LINE, { message: 'A name cannot contain line breaks or angle brackets.' })
  name?: string;
}
