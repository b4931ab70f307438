import { Injectable } from '@nestjs/common';
import { type Listing, PlainRecordsService, type SameSiteRef } from '../records/records.service.js';
import type { ListVisitsQueryDto } from './dto/list-visits-query.dto.js';

@Injectable()
export class VisitsService extends PlainRecordsService<ListVisitsQueryDto, 'visit'> {
  protected readonly entity = 'visit';
  protected readonly sameSite: SameSiteRef[] = [{ field: 'jobId', entity: 'job' }];

  protected listing(q: ListVisitsQueryDto): Listing {
    return {
      // A visit has no words of its own: it is found by its job and its site.
      search: [],
      searchThrough: [
        { field: 'jobId', entity: 'job', columns: ['reference', 'title'] },
        { field: 'siteId', entity: 'site', columns: ['name', 'address', 'postcode'] },
      ],
      filters: { jobId: q.jobId, siteId: q.siteId },
      listContains: { technicianIds: q.technicianId },
      range: { field: 'plannedStart', from: q.from, to: q.to },
      // The schedule's order; visits not yet scheduled come last.
      order: [['plannedStart', 'ASC', 'NULLS LAST']],
    };
  }
}
