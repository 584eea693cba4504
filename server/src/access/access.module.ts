import { Global, Module } from '@nestjs/common';
import { InvoiceAccess } from './invoice-access';
import { RegistryAccess } from './registry-access';
import { RouteDayAccess } from './route-day-access';
import { TicketAccess } from './ticket-access';

/** The ownership checks every module uses; global so stops, customers, shears and route days share one. */
@Global()
@Module({
  providers: [RegistryAccess, RouteDayAccess, TicketAccess, InvoiceAccess],
  exports: [RegistryAccess, RouteDayAccess, TicketAccess, InvoiceAccess],
})
export class AccessModule {}
