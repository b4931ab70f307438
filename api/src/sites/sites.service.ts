import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { nameOf, rowsById } from '../records/annotations.js';
import { type Listing, type OfficeRow, RecordsService } from '../records/records.service.js';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';
import { toSyncedRow } from '../sync/sync.service.js';
import type { ListSitesQueryDto } from './dto/list-sites-query.dto.js';

@Injectable()
export class SitesService extends RecordsService<ListSitesQueryDto, 'site'> {
  protected readonly entity = 'site';

  protected listing(q: ListSitesQueryDto): Listing {
    return {
      search: ['name', 'address', 'postcode'],
      searchThrough: [{ field: 'customerId', entity: 'customer', columns: ['name'] }],
      filters: { customerId: q.customerId },
      // A site without a name is known by its address.
      order: [['COALESCE(r.name, r.address)', 'ASC']],
    };
  }

  /** Each site with its customer's name, for the office's list of sites. */
  protected async annotate(em: EntityManager, user: AuthUser, rows: SyncRecord<'site'>[]): Promise<OfficeRow[]> {
    const customers = await rowsById(em, user.organisationId, 'customer', rows.map((r) => r.customerId));
    return rows.map((r) => ({ ...toSyncedRow(r), customerName: nameOf(customers.get(r.customerId)) }));
  }
}
