import { Injectable } from '@nestjs/common';
import { type Listing, PlainRecordsService, type SameSiteRef } from '../records/records.service.js';
import type { ListBoardsQueryDto } from './dto/list-boards-query.dto.js';

@Injectable()
export class BoardsService extends PlainRecordsService<ListBoardsQueryDto, 'board'> {
  protected readonly entity = 'board';
  protected readonly sameSite: SameSiteRef[] = [{ field: 'areaId', entity: 'area' }];

  protected listing(q: ListBoardsQueryDto): Listing {
    return { search: ['name', 'description'], filters: { siteId: q.siteId }, order: [['siteId', 'ASC'], ['name', 'ASC']] };
  }
}
