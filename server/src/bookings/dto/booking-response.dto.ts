import { ApiProperty } from '@nestjs/swagger';
import { EDGE_TYPES, TOOL_KINDS, type EdgeType, type ToolKind } from '@keenroute/shared';
import { MinuteWindowDto } from '../../route-days/dto/route-day-response.dto';
import { BOOKING_STATUSES, type BookingStatus } from '../entities/booking.entity';

/** Times are minutes after midnight in the business's time zone. */
export class CutoffDto {
  @ApiProperty({ example: '2026-12-07' }) date: string;
  @ApiProperty({ description: 'Minutes after midnight' }) minute: number;
}

export class PublicDayDto {
  @ApiProperty({ format: 'uuid' }) routeDayId: string;
  @ApiProperty({ example: '2026-12-08' }) day: string;
  @ApiProperty({ type: MinuteWindowDto, description: 'Expected arrival at the stop (an estimate)' })
  arrivalWindow: MinuteWindowDto;
  @ApiProperty({ description: 'Bench minutes still free for bookings that day' }) bookableMinutesLeft: number;
  @ApiProperty({ type: CutoffDto, description: 'Bookings, changes and cancellations close then' }) cutoff: CutoffDto;
  @ApiProperty({ description: 'Still taking bookings (before the cutoff, with room left)' }) open: boolean;
}

export class PublicStopSummaryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty() city: string;
  @ApiProperty({ type: [PublicDayDto] }) nextDays: PublicDayDto[];
}

export class PublicStopListDto {
  @ApiProperty({ type: [PublicStopSummaryDto] }) items: PublicStopSummaryDto[];
}

export class MailInDto {
  @ApiProperty({ description: 'Where to post shears' }) address: string;
}

export class PublicStopDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty() street: string;
  @ApiProperty() city: string;
  @ApiProperty({ type: [PublicDayDto] }) nextDays: PublicDayDto[];
  @ApiProperty({ type: MailInDto }) mailIn: MailInDto;
}

export class BookingItemResponseDto {
  @ApiProperty({ enum: TOOL_KINDS }) toolKind: ToolKind;
  @ApiProperty({ enum: EDGE_TYPES }) edgeType: EdgeType;
  @ApiProperty() count: number;
}

export class QuoteLineDto {
  @ApiProperty() label: string;
  @ApiProperty({ description: 'Integer cents; a discount is negative' }) cents: number;
}

export class BookingQuoteDto {
  @ApiProperty({ description: 'The estimated total, tax included; the price is set at the bench' })
  estimateCents: number;
  @ApiProperty() currency: string;
  @ApiProperty() benchMinutes: number;
  @ApiProperty({ type: [QuoteLineDto], description: 'Add up to estimateCents' }) lines: QuoteLineDto[];
  @ApiProperty() taxNote: string;
  @ApiProperty({ description: 'What the estimate assumes' }) note: string;
}

export class BookingStopRefDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty() city: string;
}

export class PublicBookingDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: BOOKING_STATUSES }) status: BookingStatus;
  @ApiProperty({ type: BookingStopRefDto }) stop: BookingStopRefDto;
  @ApiProperty({ nullable: true, type: String }) day: string | null;
  @ApiProperty({ nullable: true, type: String, format: 'uuid' }) routeDayId: string | null;
  @ApiProperty({ type: MinuteWindowDto, nullable: true }) arrivalWindow: MinuteWindowDto | null;
  @ApiProperty() mailIn: boolean;
  @ApiProperty() name: string;
  @ApiProperty() email: string;
  @ApiProperty() phone: string;
  @ApiProperty() notes: string;
  @ApiProperty({ type: [BookingItemResponseDto] }) items: BookingItemResponseDto[];
  @ApiProperty({ nullable: true, type: Number, description: 'An estimate, tax included' })
  estimateCents: number | null;
  @ApiProperty() benchMinutes: number;
  @ApiProperty({ type: CutoffDto, nullable: true }) cutoff: CutoffDto | null;
  @ApiProperty({ description: 'Can still be changed or cancelled' }) changeable: boolean;
}

export class CreatedBookingDto {
  @ApiProperty({ type: PublicBookingDto }) booking: PublicBookingDto;
  @ApiProperty({ description: 'The private link to change or cancel (also e-mailed)' }) manageUrl: string;
}

export class BookingDto extends PublicBookingDto {
  @ApiProperty() consent: boolean;
  @ApiProperty({ nullable: true, type: String, format: 'uuid' }) customerId: string | null;
  @ApiProperty({ nullable: true, type: String, format: 'uuid' }) ticketId: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty({ nullable: true, type: String }) cancelledAt: string | null;
}

export class BookingListDto {
  @ApiProperty({ type: [BookingDto] }) items: BookingDto[];
  @ApiProperty() total: number;
}

/** A booking as the day sheet lists it under its stop. */
export class SheetBookingDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty() phone: string;
  @ApiProperty() email: string;
  @ApiProperty() notes: string;
  @ApiProperty({ enum: BOOKING_STATUSES }) status: BookingStatus;
  @ApiProperty({ type: [BookingItemResponseDto] }) items: BookingItemResponseDto[];
  @ApiProperty() benchMinutes: number;
}
