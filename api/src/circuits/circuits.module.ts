import { Module } from '@nestjs/common';
import { CircuitsController } from './circuits.controller.js';
import { CircuitsService } from './circuits.service.js';

/** Circuit rows are synced rows: their schema, the write queue and the engine come from the global SyncModule. */
@Module({
  controllers: [CircuitsController],
  providers: [CircuitsService],
})
export class CircuitsModule {}
