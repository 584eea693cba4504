import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { PHOTO_STAGES, type PhotoStage } from '../../shears/entities/shear-photo.entity';

/** The multipart form's text field beside the photo. */
export class PhotoStageDto {
  @ApiProperty({ enum: PHOTO_STAGES, description: 'Before or after the work' })
  @IsIn(PHOTO_STAGES, { message: 'Say whether the photo is from before or after the work.' })
  stage: PhotoStage;
}
