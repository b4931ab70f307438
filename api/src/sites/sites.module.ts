import { Module } from '@nestjs/common';
import { SitesController } from './sites.controller.js';
import { SitesService } from './sites.service.js';

/** Site rows are synced rows: their schema, the write queue and the engine come from the global SyncModule. */
@Module({
  controllers: [SitesController],
  providers: [SitesService],
})
export class SitesModule {}
