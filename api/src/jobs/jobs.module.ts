import { Module } from '@nestjs/common';
import { JobProgress } from './job-progress.js';
import { JobsController } from './jobs.controller.js';
import { JobsService } from './jobs.service.js';

/**
 * Job rows are synced rows: their schema, the write queue and the engine come from the global SyncModule. Job
 * progress is exported for the features whose changes move a job (invoices and payments).
 */
@Module({
  controllers: [JobsController],
  providers: [JobsService, JobProgress],
  exports: [JobProgress],
})
export class JobsModule {}
