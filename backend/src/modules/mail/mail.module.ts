import { Global, Module } from '@nestjs/common';
import { MailController } from './mail.controller.js';
import { MailService } from './mail.service.js';
import { MailboxRepository } from './mailbox.repository.js';
import { OutboxRepository } from './outbox.repository.js';

@Global()
@Module({ controllers: [MailController], providers: [MailService, MailboxRepository, OutboxRepository], exports: [MailService] })
export class MailModule {}
