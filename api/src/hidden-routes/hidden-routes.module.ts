import { Module } from '@nestjs/common';
import { HiddenRoutesController } from './hidden-routes.controller.js';
import { HiddenRoutesService } from './hidden-routes.service.js';

/** Routes drawn over photos of open walls (synced `photoMarkup` rows): what the server refuses of them, and the site's map. */
@Module({
  controllers: [HiddenRoutesController],
  providers: [HiddenRoutesService],
})
export class HiddenRoutesModule {}
