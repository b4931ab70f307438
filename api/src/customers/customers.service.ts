import { Injectable } from '@nestjs/common';
import { type Listing, RecordsService } from '../common/records/records.service.js';
import type { ListCustomersQueryDto } from './dto/list-customers-query.dto.js';

@Injectable()
export class CustomersService extends RecordsService<ListCustomersQueryDto> {
  protected readonly entity = 'customer';

  protected listing(): Listing {
    return { search: ['name', 'email', 'phone', 'address'], order: [['name', 'ASC']] };
  }
}
