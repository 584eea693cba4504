import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ShearHistoryEntry } from './entities/shear-history-entry.entity';
import { ShearPhoto } from './entities/shear-photo.entity';
import { Shear } from './entities/shear.entity';

@Module({
  imports: [TypeOrmModule.forFeature([Shear, ShearPhoto, ShearHistoryEntry])],
})
export class ShearsModule {}
