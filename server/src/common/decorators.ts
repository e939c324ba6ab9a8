import { createParamDecorator, ExecutionContext, SetMetadata } from '@nestjs/common';
import type { Role } from '@covalent/shared-types';
import type { UserEntity } from '../users/entities/user.entity';

export const IS_PUBLIC = 'covalent:public';
export const ROLES_KEY = 'covalent:roles';

/** The route needs no sign-in (sign-in itself, health, password reset). */
export const Public = () => SetMetadata(IS_PUBLIC, true);

/** The route needs one of these roles; without it any signed-in staff member may call it. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);

/** The signed-in user, set by the AuthGuard. */
export const CurrentUser = createParamDecorator((_: unknown, ctx: ExecutionContext): UserEntity => {
  return ctx.switchToHttp().getRequest().user;
});
