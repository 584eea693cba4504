import { ApiProperty } from '@nestjs/swagger';

export class CalendarFeedDto {
  @ApiProperty({
    example: 'https://keenroute.example.test/api/calendar/3q2-7wEvQyJ9kLmN0pRsTuVwXyZaBcDeFgHiJkLmNoP.ics',
    description: 'Secret address of your route days for a calendar app (subscribe by URL); anyone with it can read it',
  })
  url: string;
}
