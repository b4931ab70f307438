import { Injectable } from '@nestjs/common';
import { type Listing, PlainRecordsService, type SameSiteRef } from '../records/records.service.js';
import type { ListCircuitsQueryDto } from './dto/list-circuits-query.dto.js';

@Injectable()
export class CircuitsService extends PlainRecordsService<ListCircuitsQueryDto, 'circuit'> {
  protected readonly entity = 'circuit';
  protected readonly sameSite: SameSiteRef[] = [{ field: 'boardId', entity: 'board' }];

  protected listing(q: ListCircuitsQueryDto): Listing {
    return {
      search: ['number', 'description'],
      filters: { siteId: q.siteId, boardId: q.boardId },
      // Way numbers are text ("1", "10", "L1-3"): shorter first puts 2 before 10.
      order: [['boardId', 'ASC'], ['LENGTH(r.number)', 'ASC'], ['number', 'ASC']],
    };
  }
}
