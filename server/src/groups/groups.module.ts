import { Module } from '@nestjs/common';
import { GroupPolicy } from './group.policy';
import { GroupsController } from './groups.controller';
import { GroupsService } from './groups.service';

@Module({ controllers: [GroupsController], providers: [GroupsService, GroupPolicy], exports: [GroupPolicy] })
export class GroupsModule {}
