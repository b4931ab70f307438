import { PageQueryDto } from '../../common/records/page-query.dto.js';
import { IdField } from '../../common/records/record-fields.js';

/** search matches name or description. */
export class ListBoardsQueryDto extends PageQueryDto {
  @IdField('site')
  siteId?: string;
}
