import { Global, Module } from '@nestjs/common';
import { JobsService } from './jobs.service';

/** Background jobs for every feature (visit notices now, invoice reminders later): one pg-boss per process. */
@Global()
@Module({ providers: [JobsService], exports: [JobsService] })
export class JobsModule {}
