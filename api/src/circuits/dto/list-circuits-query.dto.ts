import { PageQueryDto } from '../../records/page-query.dto.js';
import { IdField } from '../../records/record-fields.js';

/** search matches number or description. */
export class ListCircuitsQueryDto extends PageQueryDto {
  @IdField('site')
  siteId?: string;

  @IdField('board')
  boardId?: string;
}
