import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import { PhotosModule } from '../photos/photos.module.js';
import { StorageModule } from '../storage/storage.module.js';
import { ShareLink } from './entities/share-link.entity.js';
import { SharedController } from './shared.controller.js';
import { ShareLinksController } from './share-links.controller.js';
import { ShareLinksService } from './share-links.service.js';

/** Customers' links to one job's record: made by the office, opened without an account. */
@Module({
  imports: [TypeOrmModule.forFeature([ShareLink, Organisation, PhotoBlob]), PhotosModule, StorageModule],
  controllers: [ShareLinksController, SharedController],
  providers: [ShareLinksService],
  exports: [ShareLinksService],
})
export class ShareLinksModule {}
