import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/sqlite';
import { ConflictException, Injectable, UnauthorizedException } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { JwtService } from '@nestjs/jwt';
import type { AuthResponse, LoginRequest, RegisterRequest } from '@upwell/common';
import { User } from '../users/user.entity';
import { presentUser } from '../users/user.presenter';
import { hashPassword, verifyAgainstDummy, verifyPassword } from './password';
import type { TokenPayload } from './token-payload';

/** Events of sign-in sessions, for listeners elsewhere (the socket closes a signed-out person's connections). */
export const AUTH_EVENTS = { signedOutEverywhere: 'auth.signed-out-everywhere' } as const;

/** Payload of `auth.signed-out-everywhere`. */
export interface SignedOutEverywhere {
  userId: string;
}
const ALREADY_EXISTS = 'an account with this e-mail already exists; sign in instead';

/** Sign-up, sign-in, sign-out and token checks. */
@Injectable()
export class AuthService {
  constructor(
    private readonly em: EntityManager,
    private readonly jwt: JwtService,
    private readonly events: EventEmitter2,
  ) {}

  async register(body: RegisterRequest): Promise<AuthResponse> {
    if (await this.em.count(User, { email: body.email })) {
      throw new ConflictException(ALREADY_EXISTS);
    }
    const user = this.em.create(User, { email: body.email, name: body.name, passwordHash: await hashPassword(body.password) });
    try {
      await this.em.flush();
    } catch (err) {
      // Two sign-ups for one address at once both pass the check above; the unique index decides, and the loser hears the same 409.
      if (!(err instanceof UniqueConstraintViolationException)) throw err;
      this.em.clear();
      throw new ConflictException(ALREADY_EXISTS);
    }
    return this.issue(user);
  }

  async login(body: LoginRequest): Promise<AuthResponse> {
    const user = await this.em.findOne(User, { email: body.email }, { populate: ['passwordHash'] });
    // Same answer, and about the same time (an Argon2 check either way), for an unknown e-mail and a wrong password,
    // so sign-in reveals no accounts.
    const matches = user ? await verifyPassword(user.passwordHash, body.password) : await verifyAgainstDummy(body.password);
    if (!user || !matches) {
      throw new UnauthorizedException('the e-mail or the password is wrong');
    }
    return this.issue(user);
  }

  /** Signs out everywhere: every token issued before now stops working. */
  async logout(user: User): Promise<void> {
    user.tokenVersion += 1;
    await this.em.flush();
    this.events.emit(AUTH_EVENTS.signedOutEverywhere, { userId: user.id } satisfies SignedOutEverywhere);
  }

  /** The user a verified token speaks for, or null if the token was revoked. */
  async userForPayload(payload: TokenPayload, em: EntityManager = this.em): Promise<User | null> {
    if (typeof payload?.sub !== 'string') return null;
    const user = await em.findOne(User, { id: payload.sub });
    return user && user.tokenVersion === payload.ver ? user : null;
  }

  /** Verifies a raw token (for socket handshakes) and returns its user or null. */
  async userForToken(token: string, em: EntityManager = this.em): Promise<User | null> {
    try {
      return await this.userForPayload(await this.jwt.verifyAsync<TokenPayload>(token, { algorithms: ['HS256'] }), em);
    } catch {
      return null;
    }
  }

  private async issue(user: User): Promise<AuthResponse> {
    const payload: TokenPayload = { sub: user.id, ver: user.tokenVersion };
    return { accessToken: await this.jwt.signAsync(payload), user: presentUser(user) };
  }
}
