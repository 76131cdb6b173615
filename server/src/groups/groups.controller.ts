import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import {
  addMemberRequestSchema,
  changeMemberRoleRequestSchema,
  createGroupRequestSchema,
  renameGroupRequestSchema,
  type AddMemberRequest,
  type ChangeMemberRoleRequest,
  type CreateGroupRequest,
} from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { uuidParam } from '../common/ids';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { GroupsService } from './groups.service';

@ApiTags('groups')
@ApiBearerAuth()
@Controller('groups')
export class GroupsController {
  constructor(private readonly groups: GroupsService) {}

  @Get()
  @ApiOperation({ summary: 'The research groups the signed-in person belongs to' })
  list(@CurrentUser() user: User) {
    return this.groups.listMine(user);
  }

  @Post()
  @ApiOperation({ summary: 'Create a research group; its creator becomes its admin' })
  @ApiJsonBody(createGroupRequestSchema)
  create(@CurrentUser() user: User, @Body(new ZodValidationPipe(createGroupRequestSchema)) body: CreateGroupRequest) {
    return this.groups.create(user, body);
  }

  @Get(':groupId')
  @ApiOperation({ summary: 'A group with its members and their roles (members only)' })
  detail(@CurrentUser() user: User, @Param('groupId', uuidParam('groupId')) groupId: string) {
    return this.groups.detail(user, groupId);
  }

  @Patch(':groupId')
  @ApiOperation({ summary: 'Rename a group (group admins)' })
  @ApiJsonBody(renameGroupRequestSchema)
  rename(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Body(new ZodValidationPipe(renameGroupRequestSchema)) body: CreateGroupRequest,
  ) {
    return this.groups.rename(user, groupId, body.name);
  }

  @Post(':groupId/members')
  @ApiOperation({ summary: 'Add a person with an account to the group (group admins)' })
  @ApiJsonBody(addMemberRequestSchema)
  addMember(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Body(new ZodValidationPipe(addMemberRequestSchema)) body: AddMemberRequest,
  ) {
    return this.groups.addMember(user, groupId, body);
  }

  @Patch(':groupId/members/:userId')
  @ApiOperation({ summary: 'Change a member’s group role (group admins)' })
  @ApiJsonBody(changeMemberRoleRequestSchema)
  changeRole(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Param('userId', uuidParam('userId')) userId: string,
    @Body(new ZodValidationPipe(changeMemberRoleRequestSchema)) body: ChangeMemberRoleRequest,
  ) {
    return this.groups.changeRole(user, groupId, userId, body);
  }

  @Delete(':groupId/members/:userId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Remove a member (group admins), or leave the group (yourself)' })
  removeMember(
    @CurrentUser() user: User,
    @Param('groupId', uuidParam('groupId')) groupId: string,
    @Param('userId', uuidParam('userId')) userId: string,
  ) {
    return this.groups.removeMember(user, groupId, userId);
  }
}
