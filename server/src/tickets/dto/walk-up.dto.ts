import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsDefined, IsOptional, IsUUID, ValidateNested } from 'class-validator';
import { CreateCustomerDto } from '../../customers/dto/create-customer.dto';

/** A walk-up at a stop: someone not yet a customer hands over shears; the customer is registered on the spot. */
export class WalkUpDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'stopId must be a stop id.' })
  stopId: string;

  @ApiPropertyOptional({ format: 'uuid', description: "The route day; a sharpener's defaults to their day here today" })
  @IsOptional()
  @IsUUID('all', { message: 'routeDayId must be a route day id.' })
  routeDayId?: string;

  @ApiProperty({ type: CreateCustomerDto, description: 'The new customer (their stop is this stop)' })
  // @ValidateNested() alone lets a missing customer through to the service.
  @IsDefined({ message: 'customer is the new customer: at least a name.' })
  @ValidateNested()
  @Type(() => CreateCustomerDto)
  customer: CreateCustomerDto;
}
