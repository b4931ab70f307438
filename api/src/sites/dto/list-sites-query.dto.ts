import { PageQueryDto } from '../../common/records/page-query.dto.js';
import { IdField } from '../../common/records/record-fields.js';

/** search matches name, address or postcode. */
export class ListSitesQueryDto extends PageQueryDto {
  @IdField('customer')
  customerId?: string;
}
