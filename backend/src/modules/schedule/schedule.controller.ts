import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, MinRole } from '../../common/auth.decorators.js';
import { AuditService } from '../audit/audit.service.js';
import { NightlyJobService } from './nightly-job.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { runNowResultSchema, scheduleStatusSchema } from '@linkloom/shared';

@ApiTags('schedule')
@ApiBearerAuth()
@Controller('schedule')
export class ScheduleController {
  constructor(
    private readonly nightly: NightlyJobService,
    private readonly audit: AuditService,
  ) {}

  @Get()
  @MinRole('editor')
  @ApiZodResponse(scheduleStatusSchema)
  status() {
    return this.nightly.status();
  }

  /** Starts the nightly job now, exactly as the clock would; answers at once (202) and runs in the background. */
  @Post('run-now')
  @MinRole('editor')
  @HttpCode(202)
  @ApiZodResponse(runNowResultSchema, { status: 202 })
  async runNow(@CurrentUser() actor: AuthUser) {
    const status = await this.nightly.status();
    if (status.running) return { started: false, reason: 'The nightly job is already running; it was not started twice.' };
    await this.audit.record(actor, 'schedule.run-now', 'job', 'nightly');
    void this.nightly.trigger('run-now');
    return { started: true };
  }
}
