import { Body, Controller, Get, HttpCode, HttpStatus, Inject, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import type { Request, Response } from 'express';
import type { MeDto } from '@covalent/shared-types';
import { CurrentUser, Public } from '../common/decorators';
import { appConfig } from '../config/app.config';
import { UserEntity } from '../users/entities/user.entity';
import { toMeDto } from '../users/users.mapper';
import { SESSION_COOKIE } from './auth.constants';
import { AuthService } from './auth.service';
import { PasswordResetRequestDto, SetPasswordDto, SignInDto } from './dto/auth.dto';
import { setSessionCookie } from './session-cookie';
import { SignInThrottlerGuard } from './sign-in-throttler.guard';

@Controller()
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    @Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>,
  ) {}

  @Public()
  @UseGuards(SignInThrottlerGuard)
  @Post('auth/sign-in')
  @HttpCode(HttpStatus.OK)
  async signIn(@Body() dto: SignInDto, @Res({ passthrough: true }) res: Response): Promise<MeDto> {
    const { token, user } = await this.auth.signIn(dto.email, dto.password);
    this.setCookie(res, token);
    return toMeDto(user);
  }

  @Public()
  @Post('auth/sign-out')
  @HttpCode(HttpStatus.NO_CONTENT)
  async signOut(@Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<void> {
    await this.auth.signOut(req.cookies?.[SESSION_COOKIE]);
    res.clearCookie(SESSION_COOKIE, { path: '/' });
  }

  @Get('me')
  me(@CurrentUser() user: UserEntity): MeDto {
    return toMeDto(user);
  }

  @Public()
  @UseGuards(SignInThrottlerGuard)
  @Post('auth/password-reset-requests')
  @HttpCode(HttpStatus.ACCEPTED)
  async requestReset(@Body() dto: PasswordResetRequestDto): Promise<{ ok: true; message: string }> {
    await this.auth.requestPasswordReset(dto.email);
    return { ok: true, message: 'If that address has an account, a reset link is on its way.' };
  }

  @Public()
  @UseGuards(SignInThrottlerGuard)
  @Post('auth/password-reset')
  @HttpCode(HttpStatus.OK)
  async reset(@Body() dto: SetPasswordDto, @Res({ passthrough: true }) res: Response): Promise<MeDto> {
    const user = await this.auth.setPasswordWithToken(dto.token, dto.password, 'reset');
    this.setCookie(res, await this.auth.createSession(user.id));
    return toMeDto(user);
  }

  @Public()
  @UseGuards(SignInThrottlerGuard)
  @Post('auth/invitations/accept')
  @HttpCode(HttpStatus.OK)
  async acceptInvitation(@Body() dto: SetPasswordDto, @Res({ passthrough: true }) res: Response): Promise<MeDto> {
    const user = await this.auth.setPasswordWithToken(dto.token, dto.password, 'invite', dto.displayName);
    this.setCookie(res, await this.auth.createSession(user.id));
    return toMeDto(user);
  }

  private setCookie(res: Response, token: string): void {
    setSessionCookie(res, token, this.config.cookieSecure);
  }
}
