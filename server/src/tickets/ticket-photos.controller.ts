import { Body, Controller, Param, ParseUUIDPipe, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { PHOTO_MAX_BYTES } from '../shears/photo-image';
import { PhotoTooLargeMessage } from '../shears/photo-upload.interceptor';
import type { UploadedPhoto } from '../shears/shear-photos.service';
import { PhotoStageDto } from './dto/photo-stage.dto';
import { TicketDto } from './dto/ticket-response.dto';
import { TicketPhotosService } from './ticket-photos.service';

@ApiTags('tickets')
@ApiBearerAuth()
@Controller('tickets/:id/lines/:lineId/photos')
export class TicketPhotosController {
  constructor(private readonly photos: TicketPhotosService) {}

  @Roles('owner', 'office', 'sharpener')
  @Post()
  // Kept in memory like the shear photos: nothing reaches the disk before it is checked.
  @UseInterceptors(PhotoTooLargeMessage, FileInterceptor('photo', { limits: { fileSize: PHOTO_MAX_BYTES, files: 1 } }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      properties: { photo: { type: 'string', format: 'binary' }, stage: { type: 'string', enum: ['before', 'after'] } },
    },
  })
  add(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('lineId', ParseUUIDPipe) lineId: string,
    @Body() dto: PhotoStageDto,
    @UploadedFile() photo: UploadedPhoto | undefined,
  ): Promise<TicketDto> {
    return this.photos.add(actor, id, lineId, dto.stage, photo);
  }
}
