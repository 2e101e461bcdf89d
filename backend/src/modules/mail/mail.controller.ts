import { Controller, Get, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { listQuerySchema, mailboxListSchema, mailboxMessageSchema, outboxDeliveryResultSchema, outboxListSchema } from '@linkloom/shared';
import { z } from 'zod';
import { MinRole } from '../../common/auth.decorators.js';
import { ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import { MailService } from './mail.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';

const outboxQuerySchema = listQuerySchema.extend({ status: z.enum(['pending', 'sending', 'sent', 'failed']).optional() }).strict();

@ApiTags('mail')
@ApiBearerAuth()
@MinRole('admin')
@Controller()
export class MailController {
  constructor(private readonly mail: MailService) {}

  @Get('mail')
  @ApiZodQuery(listQuerySchema)
  @ApiZodResponse(mailboxListSchema)
  listMailbox(@Query(new ZodPipe(listQuerySchema)) query: { page: number; pageSize: number }) {
    return this.mail.listMailbox(query.page, query.pageSize);
  }

  @Get('mail/:id')
  @ApiZodResponse(mailboxMessageSchema)
  getMessage(@Param('id', ParseUUIDPipe) id: string) {
    return this.mail.getMailboxMessage(id);
  }

  @Get('outbox')
  @ApiZodQuery(outboxQuerySchema)
  @ApiZodResponse(outboxListSchema)
  listOutbox(@Query(new ZodPipe(outboxQuerySchema)) query: z.infer<typeof outboxQuerySchema>) {
    return this.mail.listOutbox(query.status, query.page, query.pageSize);
  }

  /** Sends what is due now instead of waiting for the next pass (e.g. after fixing the mail server). */
  @Post('outbox/deliver')
  @ApiZodResponse(outboxDeliveryResultSchema, { status: 201 })
  async deliverNow() {
    return { sent: await this.mail.deliverDue() };
  }
}
