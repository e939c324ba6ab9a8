import { CanActivate, ExecutionContext, HttpStatus, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Role } from '@covalent/shared-types';
import { ApiException } from '../common/api-error';
import { IS_PUBLIC, ROLES_KEY } from '../common/decorators';
import { SESSION_COOKIE } from './auth.constants';
import { AuthService } from './auth.service';

/** The global guard: every HTTP route needs a signed-in user unless marked @Public, and the roles it names. */
@Injectable()
export class AuthGuard implements CanActivate {
  constructor(
    private readonly auth: AuthService,
    private readonly reflector: Reflector,
  ) {}

  async canActivate(ctx: ExecutionContext): Promise<boolean> {
    if (ctx.getType() !== 'http') return true; // gateways authenticate on connection
    const targets = [ctx.getHandler(), ctx.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;
    const req = ctx.switchToHttp().getRequest();
    const user = await this.auth.userForSession(req.cookies?.[SESSION_COOKIE]);
    if (!user) throw new ApiException(HttpStatus.UNAUTHORIZED, 'unauthenticated', 'Please sign in.');
    req.user = user;
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (roles && !roles.includes(user.role)) {
      throw new ApiException(HttpStatus.FORBIDDEN, 'forbidden', 'Your role does not allow this.');
    }
    return true;
  }
}
