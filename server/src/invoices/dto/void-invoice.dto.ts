import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsString, Length } from 'class-validator';
import { trimmed } from '../../stops/dto/stop-validators';

const REASON_MESSAGE = 'Say why the invoice is void (3 to 500 characters).';

export class VoidInvoiceDto {
  @ApiProperty({ minLength: 3, maxLength: 500, example: 'Billed to the wrong salon' })
  @Transform(trimmed)
  @IsString({ message: REASON_MESSAGE })
  @Length(3, 500, { message: REASON_MESSAGE })
  reason: string;
}
