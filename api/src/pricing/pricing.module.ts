import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { LabourRate } from './entities/labour-rate.entity.js';
import { VatRate } from './entities/vat-rate.entity.js';
import { PriceListService } from './price-list.service.js';
import { PricingController } from './pricing.controller.js';
import { RatesService } from './rates.service.js';

/** The price list (synced rows), VAT and labour rates, and the organisation's terms for quotes and invoices. */
@Module({
  imports: [TypeOrmModule.forFeature([VatRate, LabourRate, Organisation])],
  controllers: [PricingController],
  providers: [PriceListService, RatesService],
})
export class PricingModule {}
