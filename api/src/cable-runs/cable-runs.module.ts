import { Module } from '@nestjs/common';
import { CableRunsController } from './cable-runs.controller.js';
import { CableRunsService } from './cable-runs.service.js';

/** Cable runs are synced rows: their schema, the write queue and the engine come from the global SyncModule. */
@Module({
  controllers: [CableRunsController],
  providers: [CableRunsService],
})
export class CableRunsModule {}
