import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { MailOutboxService } from './mail-outbox.service';
import { OutboxMessage } from './models/outbox-message.model';

@Module({
  imports: [SequelizeModule.forFeature([OutboxMessage])],
  providers: [MailOutboxService],
  exports: [MailOutboxService],
})
export class MailModule {}
