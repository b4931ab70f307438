import { Module } from '@nestjs/common';
import { PointChangesController } from './point-changes.controller.js';
import { PointChangesService } from './point-changes.service.js';

/** Point changes are synced rows: their schema, the write queue and the engine come from the global SyncModule. */
@Module({
  controllers: [PointChangesController],
  providers: [PointChangesService],
})
export class PointChangesModule {}
