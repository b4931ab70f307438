import { PageQueryDto } from '../../records/page-query.dto.js';
import { IdField } from '../../records/record-fields.js';

/** search matches name or level. */
export class ListAreasQueryDto extends PageQueryDto {
  @IdField('site')
  siteId?: string;
}
