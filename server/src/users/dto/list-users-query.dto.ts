import { ApiPropertyOptional } from '@nestjs/swagger';
import { ROLES, type Role } from '@keenroute/shared';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional } from 'class-validator';
import { PageQueryDto } from '../../common/pagination.dto';

export const USER_SORTS = ['name', 'email', 'role', 'createdAt'] as const;

export class ListUsersQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: USER_SORTS, default: 'name' })
  @IsOptional()
  @IsIn(USER_SORTS)
  sort: (typeof USER_SORTS)[number] = 'name';

  /** Pickers ask for the people who can fill a place: "sharpener,owner" to work a stop, "client" to manage one. */
  @ApiPropertyOptional({ description: 'Comma-separated roles to keep', example: 'sharpener,owner' })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.split(',').map((role) => role.trim()) : value,
  )
  @IsIn(ROLES, { each: true, message: `roles lists roles from ${ROLES.join(', ')}, separated by commas.` })
  roles?: Role[];
}
