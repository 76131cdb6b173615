import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { User } from '../users/user.entity';

/** The signed-in person of this request, as the JWT guard found them. */
export const CurrentUser = createParamDecorator((_data: unknown, ctx: ExecutionContext): User => {
  return ctx.switchToHttp().getRequest<{ user: User }>().user;
});
