import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '@keenroute/shared';
import type { User } from '../entities/user.entity';

export const USER_STATUSES = ['invited', 'active', 'deactivated'] as const;
export type UserStatus = (typeof USER_STATUSES)[number];

export class UserSummaryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES }) role: Role;
}

export class UserResponseDto extends UserSummaryDto {
  @ApiProperty({ enum: USER_STATUSES }) status: UserStatus;
  @ApiProperty() createdAt: string;
  @ApiProperty({ nullable: true, type: String }) lastSignInAt: string | null;
}

export class UserListDto {
  @ApiProperty({ type: [UserResponseDto] }) items: UserResponseDto[];
  @ApiProperty() total: number;
}

export function userStatus(user: User): UserStatus {
  if (!user.active) return 'deactivated';
  return user.passwordHash ? 'active' : 'invited';
}

export const toUserSummary = (user: User): UserSummaryDto => ({
  id: user.id,
  email: user.email,
  name: user.name,
  role: user.role,
});

export const toUserResponse = (user: User): UserResponseDto => ({
  ...toUserSummary(user),
  status: userStatus(user),
  createdAt: user.createdAt.toISOString(),
  lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
});
