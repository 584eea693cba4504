import { Body, Controller, Get, HttpCode, HttpStatus, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { InviteUserDto } from './dto/invite-user.dto';
import { ListUsersQueryDto } from './dto/list-users-query.dto';
import { UpdateUserDto } from './dto/update-user.dto';
import { toUserResponse, UserListDto, UserResponseDto } from './dto/user-response.dto';
import { UsersService } from './users.service';

@ApiTags('users')
@ApiBearerAuth()
@Roles('owner', 'office')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  async list(@Query() query: ListUsersQueryDto): Promise<UserListDto> {
    const { items, total } = await this.users.list(query);
    return { items: items.map(toUserResponse), total };
  }

  @Get(':id')
  async get(@Param('id', ParseUUIDPipe) id: string): Promise<UserResponseDto> {
    return toUserResponse(await this.users.get(id));
  }

  @Post('invitations')
  async invite(@CurrentUser() actor: Actor, @Body() dto: InviteUserDto): Promise<UserResponseDto> {
    return toUserResponse(await this.users.invite(actor, dto));
  }

  @Post(':id/invitations')
  @HttpCode(HttpStatus.ACCEPTED)
  async resendInvitation(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<void> {
    await this.users.resendInvitation(actor, id);
  }

  @Patch(':id')
  async update(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: UpdateUserDto,
  ): Promise<UserResponseDto> {
    return toUserResponse(await this.users.update(actor, id, dto));
  }
}
