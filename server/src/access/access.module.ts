import { Global, Module } from '@nestjs/common';
import { RegistryAccess } from './registry-access';
import { RouteDayAccess } from './route-day-access';
import { TicketAccess } from './ticket-access';

/** The ownership checks every module uses; global so stops, customers, shears and route days share one. */
@Global()
@Module({
  providers: [RegistryAccess, RouteDayAccess, TicketAccess],
  exports: [RegistryAccess, RouteDayAccess, TicketAccess],
})
export class AccessModule {}
