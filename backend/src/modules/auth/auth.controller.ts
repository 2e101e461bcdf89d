import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import { changePasswordSchema, signInSchema, type ChangePasswordInput, type SignInInput } from '@linkloom/shared';
import { type AuthUser, CurrentUser, Public } from '../../common/auth.decorators.js';
import { ApiZodBody, ZodPipe } from '../../common/zod-pipe.js';
import { AuthService } from './auth.service.js';

@ApiTags('auth')
@Controller()
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Throttle({ default: { limit: 30, ttl: 60_000 } })
  @Post('auth/sign-in')
  @HttpCode(200)
  @ApiZodBody(signInSchema)
  signIn(@Body(new ZodPipe(signInSchema)) body: SignInInput) {
    return this.auth.signIn(body);
  }

  @ApiBearerAuth()
  @Post('auth/sign-out')
  @HttpCode(204)
  async signOut(@CurrentUser() user: AuthUser) {
    await this.auth.signOut(user);
  }

  @ApiBearerAuth()
  @Get('me')
  me(@CurrentUser() user: AuthUser) {
    return this.auth.me(user);
  }

  @ApiBearerAuth()
  @Post('me/password')
  @HttpCode(200)
  @ApiZodBody(changePasswordSchema)
  changePassword(@CurrentUser() user: AuthUser, @Body(new ZodPipe(changePasswordSchema)) body: ChangePasswordInput) {
    return this.auth.changePassword(user, body);
  }
}
