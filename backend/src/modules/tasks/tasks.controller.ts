import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, MinRole } from '../../common/auth.decorators.js';
import { ApiZodBody, ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import {
  type BulkCreateTasksInput,
  bulkCreateTasksSchema,
  commentSchema,
  type CreateTaskInput,
  createTaskSchema,
  type ListTasksQuery,
  listTasksQuerySchema,
  type UpdateTaskInput,
  updateTaskSchema,
} from '@linkloom/shared';
import { TaskCreationService } from './task-creation.service.js';
import { TasksService } from './tasks.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { assigneeListSchema, taskBatchSchema, taskDetailSchema, taskEventSchema, taskItemSchema, taskListSchema } from '@linkloom/shared';

@ApiTags('tasks')
@ApiBearerAuth()
@Controller('tasks')
export class TasksController {
  constructor(
    private readonly tasks: TasksService,
    private readonly creation: TaskCreationService,
  ) {}

  @Get()
  @ApiZodQuery(listTasksQuerySchema)
  @ApiZodResponse(taskListSchema)
  list(@CurrentUser() actor: AuthUser, @Query(new ZodPipe(listTasksQuerySchema)) query: ListTasksQuery) {
    return this.tasks.list(actor, query);
  }

  @Get('assignees')
  @MinRole('editor')
  @ApiZodResponse(assigneeListSchema)
  assignees() {
    return this.tasks.assigneeOptions().then((items) => ({ items, total: items.length, page: 1, pageSize: items.length }));
  }

  @Post()
  @MinRole('editor')
  @ApiZodBody(createTaskSchema)
  @ApiZodResponse(taskItemSchema, { status: 201 })
  create(@CurrentUser() actor: AuthUser, @Body(new ZodPipe(createTaskSchema)) body: CreateTaskInput) {
    return this.creation.create(actor, body);
  }

  @Post('bulk')
  @MinRole('editor')
  @ApiZodBody(bulkCreateTasksSchema)
  @ApiZodResponse(taskBatchSchema, { status: 201 })
  bulkCreate(@CurrentUser() actor: AuthUser, @Body(new ZodPipe(bulkCreateTasksSchema)) body: BulkCreateTasksInput) {
    return this.creation.createMany(actor, body).then((items) => ({ items }));
  }

  @Get(':taskId')
  @ApiZodResponse(taskDetailSchema)
  get(@CurrentUser() actor: AuthUser, @Param('taskId', ParseUUIDPipe) id: string) {
    return this.tasks.get(actor, id);
  }

  @Patch(':taskId')
  @MinRole('writer')
  @ApiZodBody(updateTaskSchema)
  @ApiZodResponse(taskItemSchema)
  update(
    @CurrentUser() actor: AuthUser,
    @Param('taskId', ParseUUIDPipe) id: string,
    @Body(new ZodPipe(updateTaskSchema)) body: UpdateTaskInput,
  ) {
    return this.tasks.update(actor, id, body);
  }

  @Post(':taskId/comments')
  @MinRole('writer')
  @ApiZodBody(commentSchema)
  @ApiZodResponse(taskEventSchema, { status: 201 })
  comment(
    @CurrentUser() actor: AuthUser,
    @Param('taskId', ParseUUIDPipe) id: string,
    @Body(new ZodPipe(commentSchema)) body: { body: string },
  ) {
    return this.tasks.comment(actor, id, body.body);
  }
}
