import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DocumentCounter } from './entities/document-counter.entity.js';
import { PrintedRecord } from './entities/printed-record.entity.js';

/**
 * What issuing a certificate, report, quote, invoice or credit note has in common: the gapless numbering, the
 * PDF layout, the covering e-mail and its state written back. Documents and invoices stand on it; it knows neither.
 */
@Module({
  imports: [TypeOrmModule.forFeature([DocumentCounter, PrintedRecord])],
  exports: [TypeOrmModule],
})
export class PaperworkModule {}
