import { Controller, Get, HttpStatus, Inject, Query, Req, Res } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import type { AuthConfigDto } from '@covalent/shared-types';
import type { Request, Response } from 'express';
import { ApiException } from '../../common/api-error';
import { Public } from '../../common/decorators';
import { appConfig } from '../../config/app.config';
import { setSessionCookie } from '../session-cookie';
import { signInErrorLocation } from './sign-on-decision';
import { SIGN_ON_FLOW_COOKIE, SIGN_ON_FLOW_COOKIE_PATH, SIGN_ON_FLOW_TTL_MS } from './sign-on-flow';
import { SignOnService } from './sign-on.service';

/** School sign-on: full-page redirects to the provider and back; errors land on the sign-in page. */
@Controller('auth')
export class SignOnController {
  constructor(
    private readonly signOn: SignOnService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  @Public()
  @Get('config')
  config(): AuthConfigDto {
    return { signOn: this.signOn.enabled };
  }

  @Public()
  @Get('sign-on')
  async start(@Query('next') next: unknown, @Res() res: Response): Promise<void> {
    this.assertEnabled();
    const started = await this.signOn.start(next);
    res.setHeader('Cache-Control', 'no-store');
    if (!started.ok) return res.redirect(302, signInErrorLocation(this.app.publicUrl, started.error));
    res.cookie(SIGN_ON_FLOW_COOKIE, started.flowCookie, {
      httpOnly: true,
      // Lax: the provider's redirect back is a top-level GET, which still carries it.
      sameSite: 'lax',
      secure: this.app.cookieSecure,
      path: SIGN_ON_FLOW_COOKIE_PATH,
      maxAge: SIGN_ON_FLOW_TTL_MS,
    });
    res.redirect(302, started.redirectTo);
  }

  @Public()
  @Get('sign-on/callback')
  async callback(@Req() req: Request, @Res() res: Response): Promise<void> {
    this.assertEnabled();
    const rawQuery = req.originalUrl.includes('?') ? req.originalUrl.slice(req.originalUrl.indexOf('?') + 1) : '';
    // The flow cookie is spent whatever happens next.
    res.setHeader('Cache-Control', 'no-store');
    res.clearCookie(SIGN_ON_FLOW_COOKIE, { path: SIGN_ON_FLOW_COOKIE_PATH, httpOnly: true, sameSite: 'lax', secure: this.app.cookieSecure });
    const result = await this.signOn.finish(rawQuery, req.cookies?.[SIGN_ON_FLOW_COOKIE]);
    if (!result.ok) return res.redirect(302, signInErrorLocation(this.app.publicUrl, result.error));
    setSessionCookie(res, result.sessionToken, this.app.cookieSecure);
    res.redirect(302, `${this.app.publicUrl}${result.next}`);
  }

  private assertEnabled(): void {
    if (!this.signOn.enabled) {
      throw new ApiException(HttpStatus.NOT_FOUND, 'sign_on_unavailable', 'School sign-on is not set up on this server.');
    }
  }
}
