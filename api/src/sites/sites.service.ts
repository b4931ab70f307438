import { Injectable } from '@nestjs/common';
import { type Listing, RecordsService } from '../common/records/records.service.js';
import type { ListSitesQueryDto } from './dto/list-sites-query.dto.js';

@Injectable()
export class SitesService extends RecordsService<ListSitesQueryDto> {
  protected readonly entity = 'site';

  protected listing(q: ListSitesQueryDto): Listing {
    return {
      search: ['name', 'address', 'postcode'],
      filters: { customerId: q.customerId },
      // A site without a name is known by its address.
      order: [['COALESCE(r.name, r.address)', 'ASC']],
    };
  }
}
