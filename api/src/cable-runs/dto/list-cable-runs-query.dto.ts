import { CABLE_STATUSES } from '@wiretrail/core';
import { PageQueryDto } from '../../records/page-query.dto.js';
import { ChoiceField, IdField } from '../../records/record-fields.js';

/** search matches the label or either end's description. */
export class ListCableRunsQueryDto extends PageQueryDto {
  @IdField('site', { description: "the site's whole cable schedule" })
  siteId?: string;

  @IdField('job', { description: 'cable runs last recorded on one of this job’s visits' })
  jobId?: string;

  @IdField('visit', { description: 'cable runs last recorded on this visit' })
  visitId?: string;

  @ChoiceField(CABLE_STATUSES)
  status?: (typeof CABLE_STATUSES)[number];
}
