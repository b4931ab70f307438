import { Injectable } from '@nestjs/common';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { type Listing, PlainRecordsService } from '../records/records.service.js';
import type { CreatePriceItemDto } from './dto/create-price-item.dto.js';
import type { ListPriceItemsQueryDto } from './dto/list-price-items-query.dto.js';
import type { UpdatePriceItemDto } from './dto/update-price-item.dto.js';
import { activeVatRate, loadRateBook } from './rate-book.js';

/**
 * The organisation's price list over REST for the office. Items are synced rows (every phone gets them to pick
 * parts offline), so writes go through the sync engine like any other; the VAT rate must be one the office set up.
 */
@Injectable()
export class PriceListService extends PlainRecordsService<ListPriceItemsQueryDto, 'priceItem'> {
  protected readonly entity = 'priceItem';

  protected listing(q: ListPriceItemsQueryDto): Listing {
    return { search: ['name', 'code', 'category'], filters: { category: q.category }, order: [['category', 'ASC', 'NULLS LAST'], ['name', 'ASC']] };
  }

  async create(user: AuthUser, dto: CreatePriceItemDto) {
    await this.checkVatRate(user, dto.vatRateCode);
    return super.create(user, dto);
  }

  async update(user: AuthUser, id: string, dto: UpdatePriceItemDto) {
    await this.checkVatRate(user, dto.vatRateCode);
    return super.update(user, id, dto);
  }

  private async checkVatRate(user: AuthUser, code: string | null | undefined): Promise<void> {
    if (typeof code !== 'string') return;
    activeVatRate(await this.queue.read((em) => loadRateBook(em, user.organisationId)), code);
  }
}
