import { POINT_ACTIONS } from '@wiretrail/core';
import { PageQueryDto } from '../../common/records/page-query.dto.js';
import { ChoiceField, IdField } from '../../common/records/record-fields.js';

/** search matches the accessory or either position's description. */
export class ListPointChangesQueryDto extends PageQueryDto {
  @IdField('job', { description: 'point changes made on this job’s visits' })
  jobId?: string;

  @IdField('visit')
  visitId?: string;

  @IdField('site')
  siteId?: string;

  @IdField('circuit')
  circuitId?: string;

  @ChoiceField(POINT_ACTIONS)
  action?: (typeof POINT_ACTIONS)[number];
}
