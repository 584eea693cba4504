import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CustomerStopHistory } from '../customers/entities/customer-stop-history.entity';
import { Customer } from '../customers/entities/customer.entity';
import { ShearHistoryEntry } from '../shears/entities/shear-history-entry.entity';
import { Shear } from '../shears/entities/shear.entity';
import { Stop } from '../stops/entities/stop.entity';
import { CsvImport } from './entities/csv-import.entity';
import { ImportsController } from './imports.controller';
import { ImportsService } from './imports.service';

@Module({
  // The registry's entities too: the import inserts into their tables directly, in its own transaction.
  imports: [TypeOrmModule.forFeature([CsvImport, Stop, Customer, CustomerStopHistory, Shear, ShearHistoryEntry])],
  controllers: [ImportsController],
  providers: [ImportsService],
})
export class ImportsModule {}
