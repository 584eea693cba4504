import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';

/** Far past any list Keenroute keeps (100 000 pages of 100). */
const PAGE_MAX = 100_000;
const PAGE_MESSAGE = `page is a whole number from 1 to ${PAGE_MAX}.`;

/** page, pageSize, q and order for every list route; each list adds its own `sort` choices. */
export class PageQueryDto {
  @ApiPropertyOptional({ default: 1, maximum: PAGE_MAX })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: PAGE_MESSAGE })
  @Min(1, { message: PAGE_MESSAGE })
  // Without a cap, page=1e308 passes @IsInt() and makes an OFFSET PostgreSQL cannot read.
  @Max(PAGE_MAX, { message: PAGE_MESSAGE })
  page = 1;

  @ApiPropertyOptional({ default: 25, maximum: 100 })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'pageSize is a whole number from 1 to 100.' })
  @Min(1, { message: 'pageSize is a whole number from 1 to 100.' })
  @Max(100, { message: 'pageSize is a whole number from 1 to 100.' })
  pageSize = 25;

  @ApiPropertyOptional({ description: 'Search text' })
  @IsOptional()
  @IsString({ message: 'Search text is up to 100 characters.' })
  @MaxLength(100, { message: 'Search text is up to 100 characters.' })
  q?: string;

  @ApiPropertyOptional({ enum: ['asc', 'desc'], default: 'asc' })
  @IsOptional()
  @IsIn(['asc', 'desc'])
  order: 'asc' | 'desc' = 'asc';
}

/** Escapes LIKE wildcards so a search for "50%" means the text, not a pattern. */
export const likePattern = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
