import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';
import { PageQueryDto } from '../../common/pagination.dto';

export const USER_SORTS = ['name', 'email', 'role', 'createdAt'] as const;

export class ListUsersQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: USER_SORTS, default: 'name' })
  @IsOptional()
  @IsIn(USER_SORTS)
  sort: (typeof USER_SORTS)[number] = 'name';
}
