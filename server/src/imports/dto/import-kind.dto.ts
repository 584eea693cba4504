import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { IMPORT_KINDS, type ImportKind } from '../import-kinds';

const message = `kind must be one of ${IMPORT_KINDS.join(', ')}.`;

export class ImportKindParamsDto {
  @ApiProperty({ enum: IMPORT_KINDS })
  @IsIn(IMPORT_KINDS, { message })
  kind: ImportKind;
}

/** The form fields beside the file of POST /api/imports. */
export class CreateImportDto {
  @ApiProperty({ enum: IMPORT_KINDS, description: 'What the file holds' })
  @IsIn(IMPORT_KINDS, { message })
  kind: ImportKind;
}
