import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ShearHistoryEntry } from './entities/shear-history-entry.entity';
import { ShearPhoto } from './entities/shear-photo.entity';
import { Shear } from './entities/shear.entity';
import { ShearLabelsService } from './shear-labels.service';
import { ShearPhotosController } from './shear-photos.controller';
import { ShearPhotosService } from './shear-photos.service';
import { ShearsController } from './shears.controller';
import { ShearsService } from './shears.service';

@Module({
  imports: [TypeOrmModule.forFeature([Shear, ShearPhoto, ShearHistoryEntry])],
  controllers: [ShearsController, ShearPhotosController],
  providers: [ShearsService, ShearPhotosService, ShearLabelsService],
  exports: [ShearsService, ShearPhotosService],
})
export class ShearsModule {}
