import { Body, Controller, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { updateMeRequestSchema, type UpdateMeRequest } from '@upwell/common';
import { CurrentUser } from '../auth/current-user.decorator';
import { ApiJsonBody } from '../common/api-docs';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from './user.entity';
import { UsersService } from './users.service';

@ApiTags('users')
@ApiBearerAuth()
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Patch('me')
  @ApiOperation({ summary: 'Change the signed-in person’s display name or notification-mail setting' })
  @ApiJsonBody(updateMeRequestSchema)
  updateMe(@CurrentUser() user: User, @Body(new ZodValidationPipe(updateMeRequestSchema)) body: UpdateMeRequest) {
    return this.users.updateMe(user, body);
  }
}
