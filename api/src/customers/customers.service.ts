import { Injectable } from '@nestjs/common';
import { type EntityManager, In, IsNull } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { type Listing, type OfficeRow, RecordsService } from '../records/records.service.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { toSyncedRow } from '../sync/sync.service.js';
import type { ListCustomersQueryDto } from './dto/list-customers-query.dto.js';

@Injectable()
export class CustomersService extends RecordsService<ListCustomersQueryDto, 'customer'> {
  protected readonly entity = 'customer';

  protected listing(): Listing {
    return { search: ['name', 'email', 'phone', 'address'], order: [['name', 'ASC']] };
  }

  /** Each customer with the sites the office works at for them, by name. */
  protected async annotate(em: EntityManager, user: AuthUser, rows: SyncRecord<'customer'>[]): Promise<OfficeRow[]> {
    const sites = rows.length
      ? await syncRepository(em, 'site').find({
          where: { customerId: In(rows.map((r) => r.id)), organisationId: user.organisationId, deletedAt: IsNull() },
          select: { id: true, customerId: true, name: true, address: true },
          order: { address: 'ASC' },
        })
      : [];
    return rows.map((r) => ({
      ...toSyncedRow(r),
      sites: sites.filter((s) => s.customerId === r.id).map((s) => ({ id: s.id, name: s.name ?? s.address })),
    }));
  }
}
