import { Module } from '@nestjs/common';
import { VisitsController } from './visits.controller.js';
import { VisitsService } from './visits.service.js';

/** Visit rows are synced rows: their schema, the write queue and the engine come from the global SyncModule. */
@Module({
  controllers: [VisitsController],
  providers: [VisitsService],
})
export class VisitsModule {}
