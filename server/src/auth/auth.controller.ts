import { Body, Controller, Get, HttpCode, Post, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import { loginRequestSchema, registerRequestSchema, type LoginRequest, type RegisterRequest } from '@upwell/common';
import { ApiJsonBody } from '../common/api-docs';
import { ZodValidationPipe } from '../common/zod-validation.pipe';
import { User } from '../users/user.entity';
import { UsersService } from '../users/users.service';
import { AuthService } from './auth.service';
import { CurrentUser } from './current-user.decorator';
import { Public } from './public.decorator';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
  ) {}

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('register')
  @ApiOperation({ summary: 'Create an account and sign in; answers { accessToken, user }' })
  @ApiJsonBody(registerRequestSchema)
  register(@Body(new ZodValidationPipe(registerRequestSchema)) body: RegisterRequest) {
    return this.auth.register(body);
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('login')
  @HttpCode(200)
  @ApiOperation({ summary: 'Sign in with e-mail and password; answers { accessToken, user }' })
  @ApiJsonBody(loginRequestSchema)
  login(@Body(new ZodValidationPipe(loginRequestSchema)) body: LoginRequest) {
    return this.auth.login(body);
  }

  @Post('logout')
  @HttpCode(204)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Sign out everywhere: every token issued so far stops working' })
  logout(@CurrentUser() user: User) {
    return this.auth.logout(user);
  }

  @Get('me')
  @ApiBearerAuth()
  @ApiOperation({ summary: 'The signed-in person and their research groups' })
  @ApiOkResponse({ description: '{ id, name, email, createdAt, groups: [{ id, name, role }] }' })
  me(@CurrentUser() user: User) {
    return this.users.me(user);
  }
}
