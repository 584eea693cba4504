import { ApiProperty } from '@nestjs/swagger';
import { WEEKDAYS, type Weekday } from '@keenroute/shared';
import { Transform } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  Length,
  Max,
  Min,
} from 'class-validator';
import { trimmed } from '../../stops/dto/stop-validators';

/** The planning settings as read and written; the owner changes them. */
export class PlanningSettingsDto {
  @ApiProperty({ description: 'Where route days start and end (the workshop or home base)' })
  @Transform(trimmed)
  @IsString()
  @Length(1, 200, { message: 'Name the base (up to 200 characters).' })
  baseLabel: string;

  @ApiProperty()
  @IsNumber({}, { message: 'baseLatitude is a number from -90 to 90.' })
  @Min(-90)
  @Max(90)
  baseLatitude: number;

  @ApiProperty()
  @IsNumber({}, { message: 'baseLongitude is a number from -180 to 180.' })
  @Min(-180)
  @Max(180)
  baseLongitude: number;

  @ApiProperty({ enum: WEEKDAYS, isArray: true })
  @IsArray()
  @ArrayMinSize(1, { message: 'Choose at least one work day.' })
  @ArrayMaxSize(7)
  @IsIn(WEEKDAYS, { each: true, message: 'workWeekdays are mon, tue, wed, thu, fri, sat, sun.' })
  workWeekdays: Weekday[];

  @ApiProperty({ description: 'Leaves the base, minutes after midnight' })
  @IsInt({ message: 'shiftStart is minutes after midnight (0-1439).' })
  @Min(0, { message: 'shiftStart is minutes after midnight (0-1439).' })
  @Max(1439, { message: 'shiftStart is minutes after midnight (0-1439).' })
  shiftStart: number;

  @ApiProperty({ description: 'Back at the base by, minutes after midnight' })
  @IsInt({ message: 'latestFinish is minutes after midnight (1-1440).' })
  @Min(1)
  @Max(1440)
  latestFinish: number;

  @ApiProperty()
  @IsInt({ message: 'lunchEarliest is minutes after midnight (0-1439).' })
  @Min(0, { message: 'lunchEarliest is minutes after midnight (0-1439).' })
  @Max(1439, { message: 'lunchEarliest is minutes after midnight (0-1439).' })
  lunchEarliest: number;

  @ApiProperty()
  @IsInt({ message: 'lunchLatest is minutes after midnight (0-1439).' })
  @Min(0, { message: 'lunchLatest is minutes after midnight (0-1439).' })
  @Max(1439, { message: 'lunchLatest is minutes after midnight (0-1439).' })
  lunchLatest: number;

  @ApiProperty({ description: '0 plans no break' })
  @IsInt()
  @Min(0)
  @Max(180, { message: 'A break is at most 180 minutes.' })
  lunchMinutes: number;

  @ApiProperty({ description: 'Road km per great-circle km (1.2 to 1.4 is usual)' })
  @IsNumber({ maxDecimalPlaces: 2 }, { message: 'circuity is a number like 1.3.' })
  @Min(1, { message: 'circuity is at least 1.0 (roads are never shorter than the straight line).' })
  @Max(2, { message: 'circuity is at most 2.0.' })
  circuity: number;

  @ApiProperty()
  @IsInt({ message: 'averageSpeedKmh is whole km/h from 5 to 130.' })
  @Min(5, { message: 'averageSpeedKmh is whole km/h from 5 to 130.' })
  @Max(130, { message: 'averageSpeedKmh is whole km/h from 5 to 130.' })
  averageSpeedKmh: number;

  @ApiProperty({ description: 'Visit notices go out this many days before the route day' })
  @IsInt()
  @Min(0)
  @Max(28, { message: 'noticeDays is 0 to 28.' })
  noticeDays: number;

  @ApiProperty({ description: 'How long "plan the week" may search' })
  @IsInt()
  @Min(1)
  @Max(30, { message: 'solveSeconds is 1 to 30.' })
  solveSeconds: number;

  @ApiProperty({ description: 'Bookings for a route day close this many days before it (default 1)', required: false })
  @IsOptional()
  @IsInt({ message: 'bookingCutoffDaysBefore is whole days, 0 to 14.' })
  @Min(0, { message: 'bookingCutoffDaysBefore is whole days, 0 to 14.' })
  @Max(14, { message: 'bookingCutoffDaysBefore is whole days, 0 to 14.' })
  bookingCutoffDaysBefore?: number;

  @ApiProperty({ description: 'At this hour, 0-23, in the business time zone (default 18)', required: false })
  @IsOptional()
  @IsInt({ message: 'bookingCutoffHour is an hour of the day, 0 to 23.' })
  @Min(0, { message: 'bookingCutoffHour is an hour of the day, 0 to 23.' })
  @Max(23, { message: 'bookingCutoffHour is an hour of the day, 0 to 23.' })
  bookingCutoffHour?: number;
}
