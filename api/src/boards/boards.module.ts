import { Module } from '@nestjs/common';
import { BoardsController } from './boards.controller.js';
import { BoardsService } from './boards.service.js';

/** Board rows are synced rows: their schema, the write queue and the engine come from the global SyncModule. */
@Module({
  controllers: [BoardsController],
  providers: [BoardsService],
})
export class BoardsModule {}
