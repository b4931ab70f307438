import { Module } from '@nestjs/common';
import { JobsController } from './jobs.controller.js';
import { JobsService } from './jobs.service.js';

/** Job rows are synced rows: their schema, the write queue and the engine come from the global SyncModule. */
@Module({
  controllers: [JobsController],
  providers: [JobsService],
})
export class JobsModule {}
