import { Global, Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module';
import { RealtimeEvents } from './realtime-events';
import { RealtimeGateway } from './realtime.gateway';

/** The socket and the events services push through it. */
@Global()
@Module({ imports: [AuthModule], providers: [RealtimeGateway, RealtimeEvents], exports: [RealtimeEvents] })
export class RealtimeModule {}
