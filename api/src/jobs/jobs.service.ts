import { Injectable } from '@nestjs/common';
import { type Listing, RecordsService } from '../common/records/records.service.js';
import type { ListJobsQueryDto } from './dto/list-jobs-query.dto.js';

@Injectable()
export class JobsService extends RecordsService<ListJobsQueryDto> {
  protected readonly entity = 'job';

  protected listing(q: ListJobsQueryDto): Listing {
    return {
      search: ['reference', 'title', 'description'],
      filters: { status: q.status, siteId: q.siteId, customerId: q.customerId },
      // Newest first; ids are UUIDv7, so they break ties within the second createdAt keeps.
      order: [['createdAt', 'DESC'], ['id', 'DESC']],
    };
  }
}
