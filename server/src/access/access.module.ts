import { Global, Module } from '@nestjs/common';
import { RegistryAccess } from './registry-access';

/** The ownership checks every registry module uses; global so stops, customers and shears share one. */
@Global()
@Module({ providers: [RegistryAccess], exports: [RegistryAccess] })
export class AccessModule {}
