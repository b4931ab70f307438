import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { storageConfig } from '../config/storage.config.js';
import { createDocumentStorage, createInvoiceStorage, createPhotoStorage, DOCUMENT_STORAGE, INVOICE_STORAGE, PHOTO_STORAGE } from './file-stores.js';

/** The stores of photos' bytes and of issued PDFs, one of each for the process, whichever feature asks. */
@Module({
  imports: [ConfigModule.forFeature(storageConfig)],
  providers: [
    { provide: PHOTO_STORAGE, inject: [storageConfig.KEY], useFactory: createPhotoStorage },
    { provide: DOCUMENT_STORAGE, inject: [storageConfig.KEY], useFactory: createDocumentStorage },
    { provide: INVOICE_STORAGE, inject: [storageConfig.KEY], useFactory: createInvoiceStorage },
  ],
  exports: [PHOTO_STORAGE, DOCUMENT_STORAGE, INVOICE_STORAGE],
})
export class StorageModule {}
