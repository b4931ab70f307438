import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateLabourRateDto } from './dto/create-labour-rate.dto.js';
import { CreatePriceItemDto } from './dto/create-price-item.dto.js';
import { CreateVatRateDto } from './dto/create-vat-rate.dto.js';
import { ListPriceItemsQueryDto } from './dto/list-price-items-query.dto.js';
import { UpdateBillingTermsDto } from './dto/update-billing-terms.dto.js';
import { UpdateLabourRateDto } from './dto/update-labour-rate.dto.js';
import { UpdatePriceItemDto } from './dto/update-price-item.dto.js';
import { UpdateVatRateDto } from './dto/update-vat-rate.dto.js';
import { PriceListService } from './price-list.service.js';
import { RatesService } from './rates.service.js';

/** What the office charges: the price list, VAT rates, labour rates and terms. Technicians get the price list through sync. */
@ApiTags('pricing')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller()
export class PricingController {
  constructor(
    private readonly priceList: PriceListService,
    private readonly rates: RatesService,
  ) {}

  @Get('price-items')
  listItems(@CurrentUser() user: AuthUser, @Query() query: ListPriceItemsQueryDto) {
    return this.priceList.list(user, query);
  }

  @Get('price-items/:id')
  findItem(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.priceList.findOne(user, id);
  }

  @Post('price-items')
  createItem(@CurrentUser() user: AuthUser, @Body() dto: CreatePriceItemDto) {
    return this.priceList.create(user, dto);
  }

  @Patch('price-items/:id')
  updateItem(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdatePriceItemDto) {
    return this.priceList.update(user, id, dto);
  }

  @Get('vat-rates')
  vatRates(@CurrentUser() user: AuthUser) {
    return this.rates.vatRates(user);
  }

  @Post('vat-rates')
  createVatRate(@CurrentUser() user: AuthUser, @Body() dto: CreateVatRateDto) {
    return this.rates.createVatRate(user, dto);
  }

  @Patch('vat-rates/:id')
  updateVatRate(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateVatRateDto) {
    return this.rates.updateVatRate(user, id, dto);
  }

  @Get('labour-rates')
  labourRates(@CurrentUser() user: AuthUser) {
    return this.rates.labourRates(user);
  }

  @Post('labour-rates')
  createLabourRate(@CurrentUser() user: AuthUser, @Body() dto: CreateLabourRateDto) {
    return this.rates.createLabourRate(user, dto);
  }

  @Patch('labour-rates/:id')
  updateLabourRate(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateLabourRateDto) {
    return this.rates.updateLabourRate(user, id, dto);
  }

  @Get('billing-terms')
  terms(@CurrentUser() user: AuthUser) {
    return this.rates.terms(user);
  }

  @Patch('billing-terms')
  updateTerms(@CurrentUser() user: AuthUser, @Body() dto: UpdateBillingTermsDto) {
    return this.rates.updateTerms(user, dto);
  }
}
