import { Module } from '@nestjs/common';
import { AreasController } from './areas.controller.js';
import { AreasService } from './areas.service.js';

/** Area rows are synced rows: their schema, the write queue and the engine come from the global SyncModule. */
@Module({
  controllers: [AreasController],
  providers: [AreasService],
})
export class AreasModule {}
