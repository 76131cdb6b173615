import { Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../auth/current-user.decorator';
import { uuidParam } from '../common/ids';
import { User } from '../users/user.entity';
import { NotificationsService } from './notifications.service';

@ApiTags('notifications')
@ApiBearerAuth()
@Controller('notifications')
export class NotificationsController {
  constructor(private readonly notifications: NotificationsService) {}

  @Get()
  @ApiOperation({ summary: 'My notifications, newest first, with the unread count', description: 'Answers { items, unread }; at most 50 items.' })
  list(@CurrentUser() user: User) {
    return this.notifications.list(user);
  }

  @Post('read-all')
  @HttpCode(200)
  @ApiOperation({ summary: 'Mark all my notifications read; answers the list' })
  readAll(@CurrentUser() user: User) {
    return this.notifications.markAllRead(user);
  }

  @Post(':notificationId/read')
  @HttpCode(200)
  @ApiOperation({ summary: 'Mark one of my notifications read' })
  read(@CurrentUser() user: User, @Param('notificationId', uuidParam('notificationId')) id: string) {
    return this.notifications.markRead(user, id);
  }
}
