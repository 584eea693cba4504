import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, IsUUID, MaxLength } from 'class-validator';
import { TICKET_KINDS, type TicketKind } from '../entities/ticket.entity';

export class CreateTicketDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'Choose the customer whose shears these are.' })
  customerId: string;

  @ApiPropertyOptional({ format: 'uuid', description: 'Where the shears are worked; none for a mailed-in drop-off' })
  @IsOptional()
  @IsUUID('all', { message: 'stopId must be a stop id.' })
  stopId?: string;

  @ApiPropertyOptional({
    format: 'uuid',
    description: "The route day of the visit; a sharpener's defaults to their day at the stop today",
  })
  @IsOptional()
  @IsUUID('all', { message: 'routeDayId must be a route day id.' })
  routeDayId?: string;

  @ApiProperty({ enum: TICKET_KINDS })
  @IsIn(TICKET_KINDS, { message: `Choose the kind of ticket: ${TICKET_KINDS.join(', ')}.` })
  kind: TicketKind;

  @ApiPropertyOptional({ maxLength: 2000 })
  @IsOptional()
  @IsString()
  @MaxLength(2000, { message: 'Notes have at most 2000 characters.' })
  notes?: string;
}
