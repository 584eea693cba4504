import {
  Body,
  Controller,
  Get,
  Header,
  HttpCode,
  HttpStatus,
  Param,
  ParseUUIDPipe,
  Post,
  Res,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { MulterOptions } from '@nestjs/platform-express/multer/interfaces/multer-options.interface';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { memoryStorage } from 'multer';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { CreateImportDto, ImportKindParamsDto } from './dto/import-kind.dto';
import { CommitResultDto, ImportPreviewDto, toImportPreview } from './dto/import-preview.dto';
import { IMPORT_KINDS } from './import-kinds';
import { ImportsService, type UploadedCsv } from './imports.service';

export const MAX_FILE_BYTES = 5 * 1024 * 1024;

// defParamCharset: browsers send the file name as UTF-8; multer would read it as Latin-1 and garble accents.
const upload: MulterOptions & { defParamCharset: string } = {
  storage: memoryStorage(),
  limits: { fileSize: MAX_FILE_BYTES, files: 1, fields: 5 },
  defParamCharset: 'utf8',
};

@ApiTags('imports')
@ApiBearerAuth()
@Roles('owner', 'office')
@Controller('imports')
export class ImportsController {
  constructor(private readonly imports: ImportsService) {}

  /** The header row and one invented example row, to fill in a spreadsheet. */
  @Get('templates/:kind')
  @ApiProduces('text/csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  template(@Param() params: ImportKindParamsDto, @Res({ passthrough: true }) response: Response): string {
    response.setHeader('Content-Disposition', `attachment; filename="keenroute-${params.kind}-template.csv"`);
    return this.imports.template(params.kind);
  }

  /** Reads and checks a file without importing it; the answer says what committing it would do. */
  @Post()
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'kind'],
      properties: { file: { type: 'string', format: 'binary' }, kind: { type: 'string', enum: [...IMPORT_KINDS] } },
    },
  })
  @UseInterceptors(FileInterceptor('file', upload))
  async preview(
    @CurrentUser() actor: Actor,
    @Body() dto: CreateImportDto,
    @UploadedFile() file: UploadedCsv | undefined,
  ): Promise<ImportPreviewDto> {
    return toImportPreview(await this.imports.preview(actor, dto.kind, file));
  }

  /** Imports every row of a previewed file in one transaction, or none when any row has a problem. */
  @Post(':id/commit')
  @HttpCode(HttpStatus.OK)
  commit(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<CommitResultDto> {
    return this.imports.commit(actor, id);
  }
}
