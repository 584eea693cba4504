import { ApiProperty } from '@nestjs/swagger';
import { SheetBookingDto } from '../../bookings/dto/booking-response.dto';
import { MinuteWindowDto, RouteDayDto } from '../dto/route-day-response.dto';

export class SheetCustomerDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) phone: string | null;
  @ApiProperty({ nullable: true, type: String }) email: string | null;
  @ApiProperty({ description: 'Shears in service' }) shearCount: number;
}

export class SheetStopDto {
  @ApiProperty() position: number;
  @ApiProperty({ format: 'uuid' }) stopId: string;
  @ApiProperty() name: string;
  @ApiProperty() street: string;
  @ApiProperty() city: string;
  @ApiProperty() postalCode: string;
  @ApiProperty({ nullable: true, type: String }) phone: string | null;
  @ApiProperty({ nullable: true, type: String }) email: string | null;
  @ApiProperty() accessParking: string;
  @ApiProperty() accessDoor: string;
  @ApiProperty() accessBestTime: string;
  @ApiProperty() arrival: number;
  @ApiProperty() leave: number;
  @ApiProperty({ type: MinuteWindowDto }) arrivalWindow: MinuteWindowDto;
  @ApiProperty() benchMinutes: number;
  @ApiProperty({ description: 'Pairs expected: the shears in service at the stop' }) expectedPairs: number;
  @ApiProperty({ type: [SheetCustomerDto] }) customers: SheetCustomerDto[];
  @ApiProperty({ type: [SheetBookingDto], description: 'Drop-offs booked for this visit (cancelled ones left off)' })
  bookings: SheetBookingDto[];
}

export class SheetTotalsDto {
  @ApiProperty() stops: number;
  @ApiProperty() distanceKm: number;
  @ApiProperty() driveMinutes: number;
  @ApiProperty() benchMinutes: number;
  @ApiProperty({ nullable: true, type: Number }) departure: number | null;
  @ApiProperty({ nullable: true, type: Number }) finish: number | null;
}

export class DaySheetDto {
  @ApiProperty({ type: RouteDayDto }) routeDay: RouteDayDto;
  @ApiProperty({ type: [SheetStopDto] }) stops: SheetStopDto[];
  @ApiProperty({ type: SheetTotalsDto }) totals: SheetTotalsDto;
  @ApiProperty({ type: [String], description: "The bench's usual cautions" }) cautions: string[];
}
