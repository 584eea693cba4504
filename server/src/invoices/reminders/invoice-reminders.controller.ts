import { Body, Controller, HttpCode, HttpStatus, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Roles } from '../../auth/decorators/roles.decorator';
import { ReminderRunDto, RunRemindersDto } from './dto/reminder-run.dto';
import { InvoiceRemindersService } from './invoice-reminders.service';

@ApiTags('invoices')
@ApiBearerAuth()
@Controller('invoices/reminders')
export class InvoiceRemindersController {
  constructor(private readonly reminders: InvoiceRemindersService) {}

  /** Sends the reminders due today now instead of at the scheduled hour; running it again sends nothing twice. */
  @Roles('owner', 'office')
  @Post('run')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: ReminderRunDto })
  // The empty body type makes the validation pipe refuse extra fields, such as a "today" to send ahead of time.
  run(@Body() _body: RunRemindersDto): Promise<ReminderRunDto> {
    return this.reminders.runNow();
  }
}
