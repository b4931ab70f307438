import { PageQueryDto } from './page-query.dto.js';
import { IdField } from './record-fields.js';

/** How the office finds what was recorded on visits (point changes, test results): by job, visit, site or circuit. */
export class VisitRecordsQueryDto extends PageQueryDto {
  @IdField('job', { description: 'records made on this job’s visits' })
  jobId?: string;

  @IdField('visit')
  visitId?: string;

  @IdField('site')
  siteId?: string;

  @IdField('circuit')
  circuitId?: string;
}
