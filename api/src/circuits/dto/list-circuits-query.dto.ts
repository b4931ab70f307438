import { PageQueryDto } from '../../common/records/page-query.dto.js';
import { IdField } from '../../common/records/record-fields.js';

/** search matches number or description. */
export class ListCircuitsQueryDto extends PageQueryDto {
  @IdField('site')
  siteId?: string;

  @IdField('board')
  boardId?: string;
}
