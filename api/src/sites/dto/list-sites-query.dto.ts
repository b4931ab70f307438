import { PageQueryDto } from '../../records/page-query.dto.js';
import { IdField } from '../../records/record-fields.js';

/** search matches name, address or postcode. */
export class ListSitesQueryDto extends PageQueryDto {
  @IdField('customer')
  customerId?: string;
}
