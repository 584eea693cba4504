import { ApiProperty } from '@nestjs/swagger';
import {
  ADD_ON_CODES,
  EDGE_TYPES,
  HANDEDNESS,
  TOOL_KINDS,
  type AddOnCode,
  type EdgeType,
  type Handedness,
  type ToolKind,
} from '@keenroute/shared';
import { RefDto } from '../../customers/dto/ref.dto';
import { BENCH_STATUSES, type BenchStatus } from '../bench-status';
import {
  SETTLEMENTS,
  TICKET_KINDS,
  TICKET_STATUSES,
  type Settlement,
  type TicketKind,
  type TicketStatus,
} from '../entities/ticket.entity';
import { PaymentDto } from '../payments/dto/payment.dto';

export class TicketShearDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'KR-000123' }) tagCode: string;
  @ApiProperty() make: string;
  @ApiProperty() model: string;
  @ApiProperty({ example: 6.5 }) lengthIn: number;
  @ApiProperty({ enum: EDGE_TYPES }) edgeType: EdgeType;
  @ApiProperty({ enum: TOOL_KINDS }) toolKind: ToolKind;
  @ApiProperty({ enum: HANDEDNESS }) handedness: Handedness;
}

export class RecipeSummaryDto {
  @ApiProperty({ description: 'The bench plan in order, one line per step, then the finish' }) steps: string[];
  @ApiProperty({ description: 'Taken apart for inside-edge work' }) disassemble: boolean;
  @ApiProperty() benchMinutes: number;
  @ApiProperty({ description: 'Read before starting: the bench cautions and this edge type’s own' }) cautions: string[];
  @ApiProperty() notes: string[];
  @ApiProperty({ enum: ['common practice', 'edited'] }) source: string;
}

export class TicketPhotoDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: ['before', 'after'], nullable: true, type: String }) stage: 'before' | 'after' | null;
  @ApiProperty({ example: '/api/shears/…/photos/…', description: 'Fetched with the bearer token' }) url: string;
}

export class TicketLineDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ type: TicketShearDto }) shear: TicketShearDto;
  @ApiProperty({ enum: ADD_ON_CODES, isArray: true }) addOns: AddOnCode[];
  @ApiProperty({ description: 'The rules price of this pair, cents' }) priceCents: number;
  @ApiProperty({ example: 'convex straight shear, 6.5 in: base $42.00' }) explanation: string;
  @ApiProperty({ nullable: true, type: Number }) overrideCents: number | null;
  @ApiProperty({ nullable: true, type: String }) overrideReason: string | null;
  @ApiProperty({ description: 'The override when set, else the rules price' }) effectiveCents: number;
  @ApiProperty({ enum: BENCH_STATUSES }) benchStatus: BenchStatus;
  @ApiProperty() notes: string;
  @ApiProperty({ type: RecipeSummaryDto, nullable: true }) recipe: RecipeSummaryDto | null;
  @ApiProperty({ type: [TicketPhotoDto] }) photos: TicketPhotoDto[];
}

export class ExpectedPairsDto {
  @ApiProperty({ enum: TOOL_KINDS }) toolKind: ToolKind;
  @ApiProperty({ enum: EDGE_TYPES }) edgeType: EdgeType;
  @ApiProperty() count: number;
}

export class TicketPriceDto {
  @ApiProperty({ example: 'USD' }) currency: string;
  @ApiProperty() subtotalCents: number;
  @ApiProperty() taxCents: number;
  @ApiProperty() totalCents: number;
  @ApiProperty({ description: 'Discount, minimum, trip charge, prices set by hand and tax, in words' })
  summary: string[];
  @ApiProperty() taxNote: string;
  @ApiProperty({ description: 'This ticket carries the stop visit’s trip charge' }) chargeTrip: boolean;
  @ApiProperty({ nullable: true, type: Number }) rateCardVersion: number | null;
}

export class TicketCustomerDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) phone: string | null;
  @ApiProperty({ nullable: true, type: String }) email: string | null;
}

export class TicketDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: TICKET_KINDS }) kind: TicketKind;
  @ApiProperty({ enum: TICKET_STATUSES }) status: TicketStatus;
  @ApiProperty({ type: TicketCustomerDto }) customer: TicketCustomerDto;
  @ApiProperty({ type: RefDto, nullable: true }) stop: RefDto | null;
  @ApiProperty({ format: 'uuid', nullable: true, type: String }) routeDayId: string | null;
  @ApiProperty({ format: 'uuid', nullable: true, type: String }) bookingId: string | null;
  @ApiProperty({ example: '2026-12-09' }) visitDay: string;
  @ApiProperty({ type: [TicketLineDto] }) lines: TicketLineDto[];
  @ApiProperty({ type: [ExpectedPairsDto], description: 'Booked by kind, still to add as shears' })
  expected: ExpectedPairsDto[];
  @ApiProperty({ type: TicketPriceDto }) price: TicketPriceDto;
  @ApiProperty({ type: [PaymentDto] }) payments: PaymentDto[];
  @ApiProperty({ description: 'Total less the payments recorded' }) balanceCents: number;
  @ApiProperty({ enum: SETTLEMENTS }) settlement: Settlement;
  @ApiProperty() notes: string;
  @ApiProperty() createdAt: string;
  @ApiProperty({ nullable: true, type: String }) finishedAt: string | null;
  @ApiProperty({ nullable: true, type: String }) handedBackAt: string | null;
}

export class TicketSummaryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: TICKET_KINDS }) kind: TicketKind;
  @ApiProperty({ enum: TICKET_STATUSES }) status: TicketStatus;
  @ApiProperty({ type: RefDto }) customer: RefDto;
  @ApiProperty({ type: RefDto, nullable: true }) stop: RefDto | null;
  @ApiProperty({ format: 'uuid', nullable: true, type: String }) routeDayId: string | null;
  @ApiProperty({ example: '2026-12-09' }) visitDay: string;
  @ApiProperty() lineCount: number;
  @ApiProperty() totalCents: number;
  @ApiProperty({ enum: SETTLEMENTS }) settlement: Settlement;
  @ApiProperty() createdAt: string;
}

export class TicketListDto {
  @ApiProperty({ type: [TicketSummaryDto] }) items: TicketSummaryDto[];
  @ApiProperty() total: number;
}
