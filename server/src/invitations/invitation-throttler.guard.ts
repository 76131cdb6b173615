import { Inject, Injectable, type ExecutionContext } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Reflector } from '@nestjs/core';
import { InjectThrottlerOptions, InjectThrottlerStorage, ThrottlerGuard, type ThrottlerModuleOptions, type ThrottlerStorage } from '@nestjs/throttler';
import type { ThrottlerRequest } from '@nestjs/throttler/dist/throttler.guard.interface';
import { APP_CONFIG, type AppConfig } from '../config/app-config';

const HOUR_MS = 3_600_000;

/**
 * At most INVITATIONS_PER_HOUR invitations per person per hour, counted across
 * group and notebook invitations together, so nobody can use Upwell to flood
 * mailboxes. Counts the signed-in person (the JWT guard has run), not the address.
 */
@Injectable()
export class InvitationThrottlerGuard extends ThrottlerGuard {
  private readonly perHour: number;

  constructor(
    @InjectThrottlerOptions() options: ThrottlerModuleOptions,
    @InjectThrottlerStorage() storage: ThrottlerStorage,
    reflector: Reflector,
    @Inject(ConfigService) config: ConfigService,
  ) {
    super(options, storage, reflector);
    this.perHour = config.getOrThrow<AppConfig>(APP_CONFIG).invitationsPerHour;
  }

  protected override handleRequest(props: ThrottlerRequest): Promise<boolean> {
    return super.handleRequest({ ...props, limit: this.perHour, ttl: HOUR_MS, blockDuration: HOUR_MS });
  }

  protected override async getTracker(req: Record<string, any>): Promise<string> {
    return `user:${(req.user as { id: string }).id}`;
  }

  protected override generateKey(_context: ExecutionContext, suffix: string, name: string): string {
    return `invitations-${name}-${suffix}`;
  }

  protected override async getErrorMessage(): Promise<string> {
    return `you have sent ${this.perHour} invitations in the last hour, the most allowed; try again later`;
  }
}
