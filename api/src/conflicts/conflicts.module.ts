import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { SYNC_SCHEMAS } from '../sync/entities/sync-schemas.js';
import { ConflictsController } from './conflicts.controller.js';
import { ConflictsService } from './conflicts.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([SYNC_SCHEMAS.conflict])],
  controllers: [ConflictsController],
  providers: [ConflictsService],
})
export class ConflictsModule {}
