import { PageQueryDto } from '../../common/records/page-query.dto.js';
import { IdField } from '../../common/records/record-fields.js';

/** search matches name or level. */
export class ListAreasQueryDto extends PageQueryDto {
  @IdField('site')
  siteId?: string;
}
