import { Body, Controller, Get, HttpCode, HttpStatus, Param, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { CookieOptions, Request, Response } from 'express';
import { ROLES } from '@keenroute/shared';
import type { AppConfig } from '../config/environment';
import { UserSummaryDto } from '../users/dto/user-response.dto';
import type { Actor } from './actor';
import { AuthService, type SignedIn } from './auth.service';
import { CurrentUser } from './decorators/current-user.decorator';
import { Public } from './decorators/public.decorator';
import { Roles } from './decorators/roles.decorator';
import { LoginDto } from './dto/login.dto';
import { PasswordResetDto } from './dto/password-reset.dto';
import { LinkInfoDto, MessageDto, SessionDto } from './dto/session.dto';
import { SetPasswordDto } from './dto/set-password.dto';
import { AuthThrottlerGuard } from './guards/auth-throttler.guard';
import { REFRESH_COOKIE, REFRESH_COOKIE_PATH, REFRESH_TOKEN_DAYS } from './jwt.constants';

const RESET_ANSWER = 'If that address has an account, a link to reset the password is on its way.';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  private readonly cookie: CookieOptions;

  constructor(
    private readonly auth: AuthService,
    config: ConfigService<AppConfig, true>,
  ) {
    this.cookie = {
      httpOnly: true,
      sameSite: 'strict',
      secure: config.get('APP_URL', { infer: true }).startsWith('https:'),
      path: REFRESH_COOKIE_PATH,
    };
  }

  @Public()
  @UseGuards(AuthThrottlerGuard)
  @Post('login')
  @HttpCode(HttpStatus.OK)
  async login(@Body() dto: LoginDto, @Res({ passthrough: true }) res: Response): Promise<SessionDto> {
    return this.answer(res, await this.auth.login(dto.email, dto.password));
  }

  @Public()
  @Post('refresh')
  @HttpCode(HttpStatus.OK)
  async refresh(@Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<SessionDto> {
    try {
      return this.answer(res, await this.auth.refresh(this.refreshCookie(req)));
    } catch (error) {
      res.clearCookie(REFRESH_COOKIE, this.cookie);
      throw error;
    }
  }

  @Public()
  @Post('logout')
  @HttpCode(HttpStatus.NO_CONTENT)
  async logout(@Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<void> {
    await this.auth.logout(this.refreshCookie(req));
    res.clearCookie(REFRESH_COOKIE, this.cookie);
  }

  @ApiBearerAuth()
  @Roles(...ROLES)
  @Get('me')
  me(@CurrentUser() actor: Actor): UserSummaryDto {
    return { id: actor.id, email: actor.email, name: actor.name, role: actor.role };
  }

  @Public()
  @UseGuards(AuthThrottlerGuard)
  @Post('password-reset')
  @HttpCode(HttpStatus.ACCEPTED)
  async requestPasswordReset(@Body() dto: PasswordResetDto): Promise<MessageDto> {
    await this.auth.requestPasswordReset(dto.email);
    return { message: RESET_ANSWER };
  }

  @Public()
  @Get('tokens/:token')
  describeLink(@Param('token') token: string): Promise<LinkInfoDto> {
    return this.auth.describeLink(token);
  }

  @Public()
  @UseGuards(AuthThrottlerGuard)
  @Post('password')
  @HttpCode(HttpStatus.OK)
  async setPassword(@Body() dto: SetPasswordDto, @Res({ passthrough: true }) res: Response): Promise<SessionDto> {
    return this.answer(res, await this.auth.setPassword(dto.token, dto.password));
  }

  private answer(res: Response, signedIn: SignedIn): SessionDto {
    res.cookie(REFRESH_COOKIE, signedIn.refreshToken, {
      ...this.cookie,
      maxAge: REFRESH_TOKEN_DAYS * 24 * 3600 * 1000,
    });
    return signedIn.session;
  }

  private refreshCookie(req: Request): string | undefined {
    const value = (req.cookies as Record<string, unknown> | undefined)?.[REFRESH_COOKIE];
    return typeof value === 'string' && value.length > 0 ? value : undefined;
  }
}
