import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppConfig } from '../config/environment';

/** A moment as the business reads it: the calendar date and minute after midnight in BUSINESS_TIME_ZONE. */
export interface BusinessMoment {
  date: string;
  minute: number;
}

/** One formatter per time zone: building an Intl.DateTimeFormat costs far more than formatting with it. */
const momentFormats = new Map<string, Intl.DateTimeFormat>();

function momentFormat(timeZone: string): Intl.DateTimeFormat {
  let format = momentFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-US', {
      timeZone,
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
    });
    momentFormats.set(timeZone, format);
  }
  return format;
}

export function businessMoment(timeZone: string, at: Date): BusinessMoment {
  const parts = momentFormat(timeZone).formatToParts(at);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return {
    date: `${part('year')}-${part('month')}-${part('day')}`,
    minute: Number(part('hour')) * 60 + Number(part('minute')),
  };
}

/** What time it is for the booking cutoff; one provider so tests can move the clock past a cutoff. */
@Injectable()
export class BookingClock {
  private readonly timeZone: string;

  constructor(config: ConfigService<AppConfig, true>) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  now(): Date {
    return new Date();
  }

  moment(): BusinessMoment {
    return businessMoment(this.timeZone, this.now());
  }
}
