import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { AuthService } from './auth.service';
import type { TokenPayload } from './token-payload';

/** Reads `Authorization: Bearer <jwt>` and resolves it to a current user. */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(config: ConfigService, private readonly auth: AuthService) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: config.getOrThrow<AppConfig>(APP_CONFIG).jwtSecret,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  validate(payload: TokenPayload) {
    return this.auth.userForPayload(payload);
  }
}
