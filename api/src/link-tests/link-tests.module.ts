import { Module } from '@nestjs/common';
import { LinkTestsController } from './link-tests.controller.js';
import { LinkTestsService } from './link-tests.service.js';

/** Links' performance results at the desk: typed by hand or imported from our CSV template, through the sync engine. */
@Module({
  controllers: [LinkTestsController],
  providers: [LinkTestsService],
})
export class LinkTestsModule {}
