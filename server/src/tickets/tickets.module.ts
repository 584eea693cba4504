import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { CustomersModule } from '../customers/customers.module';
import { ShearsModule } from '../shears/shears.module';
import { CheckInController } from './check-in.controller';
import { CheckInService } from './check-in.service';
import { TicketLineOverride } from './entities/ticket-line-override.entity';
import { TicketLine } from './entities/ticket-line.entity';
import { Ticket } from './entities/ticket.entity';
import { Payment } from '../payments/entities/payment.entity';
import { TicketPaymentsService } from './payments/ticket-payments.service';
import { TicketClosing } from './ticket-closing';
import { TicketPhotosController } from './ticket-photos.controller';
import { TicketPhotosService } from './ticket-photos.service';
import { TicketReader } from './ticket-reader';
import { TicketWriter } from './ticket-writer';
import { TicketsController } from './tickets.controller';
import { TicketsService } from './tickets.service';
import { WalkUpService } from './walk-up.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([Ticket, TicketLine, TicketLineOverride, Payment]),
    ShearsModule,
    CustomersModule,
    AuditModule,
  ],
  controllers: [TicketsController, TicketPhotosController, CheckInController],
  providers: [
    TicketsService,
    TicketReader,
    TicketWriter,
    TicketClosing,
    TicketPaymentsService,
    TicketPhotosService,
    CheckInService,
    WalkUpService,
  ],
  exports: [TicketReader],
})
export class TicketsModule {}
