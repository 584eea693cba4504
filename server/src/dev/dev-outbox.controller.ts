import { Controller, Get, NotFoundException, ServiceUnavailableException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/decorators/roles.decorator';
import type { AppConfig } from '../config/environment';

interface CaughtMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  date: string;
  text: string;
  html: string;
}

/** The local mail catcher's messages, for an owner trying Keenroute without a real mail server. */
@ApiTags('dev')
@ApiBearerAuth()
@Roles('owner')
@Controller('dev/outbox')
export class DevOutboxController {
  private readonly catcherUrl: string | undefined;

  constructor(config: ConfigService<AppConfig, true>) {
    this.catcherUrl = config.get('MAIL_CATCHER_URL', { infer: true });
  }

  @Get()
  async list(): Promise<{ items: CaughtMessage[]; total: number }> {
    if (!this.catcherUrl) throw new NotFoundException('The local mail catcher is not running.');
    const response = await fetch(`${this.catcherUrl}/messages`).catch(() => null);
    if (!response?.ok) throw new ServiceUnavailableException('The local mail catcher did not answer.');
    const body = (await response.json()) as { items: CaughtMessage[]; total: number };
    const items = body.items.map(({ id, from, to, subject, date, text, html }) => ({
      id,
      from,
      to,
      subject,
      date,
      text,
      html,
    }));
    return { items, total: body.total };
  }
}
