import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BuildingNotification } from './entities/building-notification.entity.js';
import { NotifiableWorkController } from './notifiable-work.controller.js';
import { NotifiableWorkService } from './notifiable-work.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([BuildingNotification])],
  controllers: [NotifiableWorkController],
  providers: [NotifiableWorkService],
})
export class NotifiableWorkModule {}
