import { Module } from '@nestjs/common';
import { CollaborationModule } from '../collaboration/collaboration.module';
import { GroupPolicy } from './group.policy';
import { GroupsController } from './groups.controller';
import { GroupsService } from './groups.service';

@Module({ imports: [CollaborationModule], controllers: [GroupsController], providers: [GroupsService, GroupPolicy], exports: [GroupPolicy] })
export class GroupsModule {}
