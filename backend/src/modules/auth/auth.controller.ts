import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import {
  changePasswordSchema,
  signInResultSchema,
  signInSchema,
  userDetailsSchema,
  type ChangePasswordInput,
  type SignInInput,
} from '@linkloom/shared';
import { type AuthUser, CurrentUser, Public } from '../../common/auth.decorators.js';
import { ApiZodBody, ZodPipe } from '../../common/zod-pipe.js';
import { AuthService } from './auth.service.js';
import { ApiNoContentResponse, ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';

@ApiTags('auth')
@Controller()
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Throttle({ default: { limit: 30, ttl: 60_000 } })
  @Post('auth/sign-in')
  @HttpCode(200)
  @ApiZodBody(signInSchema)
  @ApiZodResponse(signInResultSchema)
  signIn(@Body(new ZodPipe(signInSchema)) body: SignInInput) {
    return this.auth.signIn(body);
  }

  @ApiBearerAuth()
  @Post('auth/sign-out')
  @HttpCode(204)
  @ApiNoContentResponse()
  async signOut(@CurrentUser() user: AuthUser) {
    await this.auth.signOut(user);
  }

  @ApiBearerAuth()
  @Get('me')
  @ApiZodResponse(userDetailsSchema)
  me(@CurrentUser() user: AuthUser) {
    return this.auth.me(user);
  }

  @ApiBearerAuth()
  @Post('me/password')
  @HttpCode(200)
  @ApiZodBody(changePasswordSchema)
  @ApiZodResponse(signInResultSchema, { description: 'A new access token: the old ones stop working.' })
  changePassword(@CurrentUser() user: AuthUser, @Body(new ZodPipe(changePasswordSchema)) body: ChangePasswordInput) {
    return this.auth.changePassword(user, body);
  }
}
