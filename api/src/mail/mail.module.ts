import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { OutboxMessage } from './entities/outbox-message.entity.js';
import { MailOutbox } from './mail-outbox.service.js';
import { MailService } from './mail.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([OutboxMessage])],
  providers: [MailService, MailOutbox],
  exports: [MailService, MailOutbox],
})
export class MailModule {}
