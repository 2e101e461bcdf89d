import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  createUserSchema,
  listQuerySchema,
  updateUserSchema,
  userDetailsListSchema,
  userDetailsSchema,
  type CreateUserInput,
  type UpdateUserInput,
} from '@linkloom/shared';
import { type AuthUser, CurrentUser, MinRole } from '../../common/auth.decorators.js';
import { ApiZodBody, ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import { UsersService } from './users.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';

@ApiTags('users')
@ApiBearerAuth()
@MinRole('admin')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @ApiZodQuery(listQuerySchema)
  @ApiZodResponse(userDetailsListSchema)
  list(@Query(new ZodPipe(listQuerySchema)) query: { page: number; pageSize: number }) {
    return this.users.list(query.page, query.pageSize);
  }

  @Post()
  @ApiZodBody(createUserSchema)
  @ApiZodResponse(userDetailsSchema, { status: 201 })
  create(@CurrentUser() actor: AuthUser, @Body(new ZodPipe(createUserSchema)) body: CreateUserInput) {
    return this.users.create(actor, body);
  }

  @Patch(':id')
  @ApiZodBody(updateUserSchema)
  @ApiZodResponse(userDetailsSchema)
  update(
    @CurrentUser() actor: AuthUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Body(new ZodPipe(updateUserSchema)) body: UpdateUserInput,
  ) {
    return this.users.update(actor, id, body);
  }
}
