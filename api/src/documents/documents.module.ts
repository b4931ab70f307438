import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { MailModule } from '../mail/mail.module.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { PaperworkModule } from '../paperwork/paperwork.module.js';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import { PhotosModule } from '../photos/photos.module.js';
import { ShareLinksModule } from '../share-links/share-links.module.js';
import { StorageModule } from '../storage/storage.module.js';
import { DocumentsController } from './documents.controller.js';
import { DocumentsService } from './documents.service.js';

/** Issuing, keeping and e-mailing the office's documents. Document rows are synced rows (SyncModule). */
@Module({
  imports: [TypeOrmModule.forFeature([Organisation, PhotoBlob]), PaperworkModule, MailModule, PhotosModule, ShareLinksModule, StorageModule],
  controllers: [DocumentsController],
  providers: [DocumentsService],
})
export class DocumentsModule {}
