import { ApiProperty } from '@nestjs/swagger';

export class ReminderRunDto {
  @ApiProperty({ example: '2026-12-24', description: "Today in the business's time zone: what was due on it" })
  today: string;
  @ApiProperty({ description: 'Reminders made now (one per invoice and stage, never twice)' })
  queued: number;
  @ApiProperty({ description: 'Earlier stages passed over because a later one was due as well' })
  skipped: number;
  @ApiProperty({ description: 'Reminders e-mailed in this run' })
  sent: number;
  @ApiProperty({ description: 'Waiting reminders dropped because the invoice was paid or voided' })
  cancelled: number;
  @ApiProperty({ description: 'Reminders that did not go: kept for a retry, or failed for good (see the send log)' })
  failed: number;
}

/** Nothing to send: a run is always for today, so a reminder can never be sent ahead of its day. */
export class RunRemindersDto {}
