import { Injectable, UnauthorizedException, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { IS_PUBLIC } from './public.decorator';

/** Global guard: every route needs a valid bearer token unless marked @Public(). */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  canActivate(context: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [context.getHandler(), context.getClass()]);
    return isPublic ? true : super.canActivate(context);
  }

  handleRequest<T>(err: unknown, user: T, info: { name?: string } | undefined): T {
    if (err || !user) {
      const expired = info?.name === 'TokenExpiredError';
      throw new UnauthorizedException(
        expired ? 'your sign-in has expired; sign in again' : 'sign in first: this route needs a valid bearer token',
      );
    }
    return user;
  }
}
