import {
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  HttpStatus,
  Param,
  ParseUUIDPipe,
  Post,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { ShearPhotoDto } from './dto/shear-response.dto';
import { PHOTO_MAX_BYTES } from './photo-image';
import { PhotoTooLargeMessage } from './photo-upload.interceptor';
import { ShearPhotosService, type PhotoFile, type PhotoVariant, type UploadedPhoto } from './shear-photos.service';

// Photos are fetched with the bearer token (as blobs), so a private cache is safe and saves repeat downloads.
const CACHE = 'private, max-age=3600';

@ApiTags('shears')
@ApiBearerAuth()
@Controller('shears/:id/photos')
export class ShearPhotosController {
  constructor(private readonly photos: ShearPhotosService) {}

  @Roles('owner', 'office', 'sharpener')
  @Post()
  @UseInterceptors(
    PhotoTooLargeMessage,
    // No storage or dest: multer keeps the upload in memory, so nothing reaches the disk before it is checked.
    FileInterceptor('photo', { limits: { fileSize: PHOTO_MAX_BYTES, files: 1 } }),
  )
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { photo: { type: 'string', format: 'binary' } } } })
  add(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @UploadedFile() photo: UploadedPhoto | undefined,
  ): Promise<ShearPhotoDto> {
    return this.photos.add(actor, id, photo);
  }

  @Roles('owner', 'office', 'sharpener', 'client')
  @Get(':photoId')
  @Header('Cache-Control', CACHE)
  @Header('X-Content-Type-Options', 'nosniff')
  original(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('photoId', ParseUUIDPipe) photoId: string,
  ): Promise<StreamableFile> {
    return this.file(actor, id, photoId, 'original');
  }

  @Roles('owner', 'office', 'sharpener', 'client')
  @Get(':photoId/thumbnail')
  @Header('Cache-Control', CACHE)
  @Header('X-Content-Type-Options', 'nosniff')
  thumbnail(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('photoId', ParseUUIDPipe) photoId: string,
  ): Promise<StreamableFile> {
    return this.file(actor, id, photoId, 'thumbnail');
  }

  @Roles('owner', 'office')
  @Delete(':photoId')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('photoId', ParseUUIDPipe) photoId: string,
  ): Promise<void> {
    return this.photos.remove(actor, id, photoId);
  }

  private async file(actor: Actor, id: string, photoId: string, variant: PhotoVariant): Promise<StreamableFile> {
    const file: PhotoFile = await this.photos.open(actor, id, photoId, variant);
    return new StreamableFile(file.body, { type: file.contentType, length: file.body.length });
  }
}
