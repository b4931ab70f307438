import { PageQueryDto } from '../../records/page-query.dto.js';
import { IdField } from '../../records/record-fields.js';

/** search matches name or description. */
export class ListBoardsQueryDto extends PageQueryDto {
  @IdField('site')
  siteId?: string;
}
