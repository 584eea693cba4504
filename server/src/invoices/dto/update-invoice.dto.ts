import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Max, Min } from 'class-validator';
import { PG_INTEGER_MAX } from '../../common/validation/limits';
import { InvoiceTermsDto } from './create-invoice.dto';

/** A draft's discount and notes; a field left out stays as it is. */
export class UpdateInvoiceDto extends InvoiceTermsDto {
  @ApiProperty({ description: 'The version as last read; a newer draft refuses the change (409)' })
  @IsInt({ message: 'version is the invoice version you last read.' })
  @Min(1, { message: 'version is the invoice version you last read.' })
  @Max(PG_INTEGER_MAX, { message: 'version is the invoice version you last read.' })
  version: number;
}
