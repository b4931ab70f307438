import { Module } from '@nestjs/common';
import { TestResultsController } from './test-results.controller.js';
import { TestResultsService } from './test-results.service.js';

/** Test results are synced rows: their schema, the write queue and the engine come from the global SyncModule. */
@Module({
  controllers: [TestResultsController],
  providers: [TestResultsService],
})
export class TestResultsModule {}
