import { Controller, Get, Param } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../auth/current-user.decorator';
import { User } from '../users/user.entity';
import { MailService } from './mail.service';

@ApiTags('mail')
@ApiBearerAuth()
@Controller('mail')
export class MailController {
  constructor(private readonly mail: MailService) {}

  @Get('status')
  @ApiOperation({ summary: 'Whether the in-process local mailbox stands in for SMTP; answers { fake }' })
  status() {
    return this.mail.status();
  }

  @Get('outbox')
  @ApiOperation({
    summary: 'Mail the local mailbox received, newest first (only while it is in use; group admins see their groups’ mail)',
    description: 'Answers { fake: true, messages }; 404 when SMTP_URL is set.',
  })
  outbox(@CurrentUser() user: User) {
    return this.mail.outbox(user);
  }

  @Get('outbox/:messageId')
  @ApiOperation({ summary: 'One captured message with its text and HTML bodies' })
  message(@CurrentUser() user: User, @Param('messageId') messageId: string) {
    return this.mail.message(user, messageId);
  }
}
