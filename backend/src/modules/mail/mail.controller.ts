import { Controller, Get, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { listQuerySchema } from '@linkloom/shared';
import { z } from 'zod';
import { MinRole } from '../../common/auth.decorators.js';
import { ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import { MailService } from './mail.service.js';

const outboxQuerySchema = listQuerySchema.extend({ status: z.enum(['pending', 'sending', 'sent', 'failed']).optional() }).strict();

@ApiTags('mail')
@ApiBearerAuth()
@MinRole('admin')
@Controller()
export class MailController {
  constructor(private readonly mail: MailService) {}

  @Get('mail')
  @ApiZodQuery(listQuerySchema)
  listMailbox(@Query(new ZodPipe(listQuerySchema)) query: { page: number; pageSize: number }) {
    return this.mail.listMailbox(query.page, query.pageSize);
  }

  @Get('mail/:id')
  getMessage(@Param('id', ParseUUIDPipe) id: string) {
    return this.mail.getMailboxMessage(id);
  }

  @Get('outbox')
  @ApiZodQuery(outboxQuerySchema)
  listOutbox(@Query(new ZodPipe(outboxQuerySchema)) query: z.infer<typeof outboxQuerySchema>) {
    return this.mail.listOutbox(query.status, query.page, query.pageSize);
  }

  /** Sends what is due now instead of waiting for the next pass (e.g. after fixing the mail server). */
  @Post('outbox/deliver')
  async deliverNow() {
    return { sent: await this.mail.deliverDue() };
  }
}
