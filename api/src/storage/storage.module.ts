import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { documentsConfig } from '../../config/documents.config.js';
import { createDocumentStorage, DOCUMENT_STORAGE } from './document-storage.js';

/** The store of issued PDFs, shared by the documents themselves and the customers' share pages. */
@Module({
  imports: [ConfigModule.forFeature(documentsConfig)],
  providers: [{ provide: DOCUMENT_STORAGE, inject: [documentsConfig.KEY], useFactory: createDocumentStorage }],
  exports: [DOCUMENT_STORAGE],
})
export class DocumentStorageModule {}
