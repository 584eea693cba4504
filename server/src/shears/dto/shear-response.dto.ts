import { ApiProperty } from '@nestjs/swagger';
import {
  EDGE_TYPES,
  HANDEDNESS,
  SHEAR_STATUSES,
  SHEAR_USES,
  TOOL_KINDS,
  type EdgeType,
  type Handedness,
  type ShearStatus,
  type ShearUse,
  type ToolKind,
} from '@keenroute/shared';
import { RefDto } from '../../customers/dto/ref.dto';
import {
  SHEAR_HISTORY_KINDS,
  type ShearHistoryEntry,
  type ShearHistoryKind,
} from '../entities/shear-history-entry.entity';
import { PHOTO_CONTENT_TYPES, type PhotoContentType, type ShearPhoto } from '../entities/shear-photo.entity';
import type { Shear } from '../entities/shear.entity';

export class ShearSummaryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'KR-000123' }) tagCode: string;
  @ApiProperty() make: string;
  @ApiProperty() model: string;
  @ApiProperty({ example: 6.5 }) lengthIn: number;
  @ApiProperty({ enum: EDGE_TYPES }) edgeType: EdgeType;
  @ApiProperty({ enum: TOOL_KINDS }) toolKind: ToolKind;
  @ApiProperty({ enum: HANDEDNESS }) handedness: Handedness;
  @ApiProperty({ enum: SHEAR_USES }) use: ShearUse;
  @ApiProperty({ enum: SHEAR_STATUSES }) status: ShearStatus;
  @ApiProperty({ type: RefDto }) customer: RefDto;
  @ApiProperty({ type: RefDto, nullable: true, description: "The customer's stop" }) stop: RefDto | null;
  @ApiProperty() photoCount: number;
  @ApiProperty({ nullable: true, type: String, example: '2025-03-14' }) lastServicedOn: string | null;
  @ApiProperty({ description: "Times sharpened: the 'serviced' rows of its history" }) sharpeningCount: number;
}

export class ShearPhotoDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ enum: PHOTO_CONTENT_TYPES }) contentType: PhotoContentType;
  @ApiProperty() width: number;
  @ApiProperty() height: number;
  @ApiProperty() byteSize: number;
  @ApiProperty() createdAt: string;
}

export class ShearHistoryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: '2025-03-14' }) happenedOn: string;
  @ApiProperty({ enum: SHEAR_HISTORY_KINDS }) kind: ShearHistoryKind;
  @ApiProperty() summary: string;
}

export class ShearDetailDto extends ShearSummaryDto {
  @ApiProperty() notes: string;
  @ApiProperty({ type: [ShearPhotoDto] }) photos: ShearPhotoDto[];
  @ApiProperty({ type: [ShearHistoryDto], description: 'Newest first' }) history: ShearHistoryDto[];
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export class ShearListDto {
  @ApiProperty({ type: [ShearSummaryDto] }) items: ShearSummaryDto[];
  @ApiProperty() total: number;
}

/** What the list query adds to each shear row. */
export interface ShearExtras {
  customer: RefDto;
  stop: RefDto | null;
  photoCount: number;
  lastServicedOn: string | null;
  sharpeningCount: number;
}

export const toShearSummary = (shear: Shear, extras: ShearExtras): ShearSummaryDto => ({
  id: shear.id,
  tagCode: shear.tagCode,
  make: shear.make,
  model: shear.model,
  lengthIn: shear.lengthIn,
  edgeType: shear.edgeType,
  toolKind: shear.toolKind,
  handedness: shear.handedness,
  use: shear.use,
  status: shear.status,
  ...extras,
});

export const toShearPhoto = (photo: ShearPhoto): ShearPhotoDto => ({
  id: photo.id,
  contentType: photo.contentType,
  width: photo.width,
  height: photo.height,
  byteSize: photo.byteSize,
  createdAt: photo.createdAt.toISOString(),
});

export const toShearHistory = (entry: ShearHistoryEntry): ShearHistoryDto => ({
  id: entry.id,
  happenedOn: entry.happenedOn,
  kind: entry.kind,
  summary: entry.summary,
});

export const toShearDetail = (
  shear: Shear,
  extras: ShearExtras,
  photos: ShearPhoto[],
  history: ShearHistoryEntry[],
): ShearDetailDto => ({
  ...toShearSummary(shear, extras),
  notes: shear.notes,
  photos: photos.map(toShearPhoto),
  history: history.map(toShearHistory),
  createdAt: shear.createdAt.toISOString(),
  updatedAt: shear.updatedAt.toISOString(),
});
