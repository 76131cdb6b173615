import { Global, Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module';
import { GroupPolicy } from '../groups/group.policy';
import { ProcessFanout } from './process-fanout';
import { RealtimeEvents } from './realtime-events';
import { RealtimeGateway } from './realtime.gateway';
import { SocketSessionGuard } from './socket-session-guard';

/** The socket, the events services push through it, and messages between server processes. */
@Global()
@Module({ imports: [AuthModule], providers: [RealtimeGateway, RealtimeEvents, ProcessFanout, SocketSessionGuard, GroupPolicy], exports: [RealtimeEvents, ProcessFanout] })
export class RealtimeModule {}
