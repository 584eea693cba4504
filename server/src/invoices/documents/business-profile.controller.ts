import {
  Body,
  CallHandler,
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  HttpStatus,
  Injectable,
  NestInterceptor,
  PayloadTooLargeException,
  Post,
  Put,
  StreamableFile,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import { catchError, throwError, type Observable } from 'rxjs';
import type { Actor } from '../../auth/actor';
import { CurrentUser } from '../../auth/decorators/current-user.decorator';
import { Roles } from '../../auth/decorators/roles.decorator';
import { BusinessProfileService, type UploadedLogo } from './business-profile.service';
import { BusinessProfileDto, UpdateBusinessProfileDto } from './dto/business-profile.dto';
import { LOGO_MAX_BYTES } from './logo-image';

/** Bound before multer's interceptor: turns its terse "File too large" into a message a person can act on. */
@Injectable()
class LogoTooLargeMessage implements NestInterceptor {
  intercept(_context: unknown, next: CallHandler): Observable<unknown> {
    return next
      .handle()
      .pipe(
        catchError((error: unknown) =>
          throwError(() =>
            error instanceof PayloadTooLargeException
              ? new PayloadTooLargeException(
                  `The logo is larger than ${LOGO_MAX_BYTES / 1024 / 1024} MB. Send a smaller picture.`,
                )
              : error,
          ),
        ),
      );
  }
}

@ApiTags('business profile')
@ApiBearerAuth()
@Controller('business-profile')
export class BusinessProfileController {
  constructor(private readonly profiles: BusinessProfileService) {}

  @Roles('owner', 'office')
  @Get()
  @ApiOkResponse({ type: BusinessProfileDto })
  get(): Promise<BusinessProfileDto> {
    return this.profiles.get();
  }

  @Roles('owner', 'office')
  @Put()
  @ApiOkResponse({ type: BusinessProfileDto })
  update(@CurrentUser() actor: Actor, @Body() dto: UpdateBusinessProfileDto): Promise<BusinessProfileDto> {
    return this.profiles.update(actor, dto);
  }

  @Roles('owner', 'office')
  @Post('logo')
  @HttpCode(HttpStatus.OK)
  // No storage: multer keeps the upload in memory, so nothing reaches the disk before sharp has read it.
  @UseInterceptors(LogoTooLargeMessage, FileInterceptor('logo', { limits: { fileSize: LOGO_MAX_BYTES, files: 1 } }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { logo: { type: 'string', format: 'binary' } } } })
  @ApiOkResponse({ type: BusinessProfileDto, description: 'Stored as a PNG at most 600 px wide' })
  uploadLogo(@CurrentUser() actor: Actor, @UploadedFile() logo: UploadedLogo | undefined): Promise<BusinessProfileDto> {
    return this.profiles.uploadLogo(actor, logo);
  }

  @Roles('owner', 'office')
  @Delete('logo')
  @HttpCode(HttpStatus.NO_CONTENT)
  removeLogo(@CurrentUser() actor: Actor): Promise<void> {
    return this.profiles.removeLogo(actor);
  }

  /** Any signed-in person: the logo shows on pages every role sees. Fetched with the token, so a private cache. */
  @Roles('owner', 'office', 'sharpener', 'client')
  @Get('logo')
  @Header('Cache-Control', 'private, max-age=3600')
  @Header('X-Content-Type-Options', 'nosniff')
  @ApiProduces('image/png')
  async logo(): Promise<StreamableFile> {
    const png = await this.profiles.requireLogo();
    return new StreamableFile(png, { type: 'image/png', length: png.length });
  }
}
