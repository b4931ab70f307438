import { Injectable } from '@nestjs/common';
import { type Listing, PlainRecordsService } from '../records/records.service.js';
import type { ListAreasQueryDto } from './dto/list-areas-query.dto.js';

@Injectable()
export class AreasService extends PlainRecordsService<ListAreasQueryDto, 'area'> {
  protected readonly entity = 'area';

  protected listing(q: ListAreasQueryDto): Listing {
    return { search: ['name', 'level'], filters: { siteId: q.siteId }, order: [['siteId', 'ASC'], ['name', 'ASC']] };
  }
}
