import { JOB_STATUSES } from '@wiretrail/core';
import { PageQueryDto } from '../../common/records/page-query.dto.js';
import { ChoiceField, IdField } from '../../common/records/record-fields.js';

/** search matches reference, title or description. */
export class ListJobsQueryDto extends PageQueryDto {
  @ChoiceField(JOB_STATUSES)
  status?: (typeof JOB_STATUSES)[number];

  @IdField('site')
  siteId?: string;

  @IdField('customer')
  customerId?: string;
}
