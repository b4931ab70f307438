import { PageQueryDto } from '../../common/records/page-query.dto.js';
import { IdField } from '../../common/records/record-fields.js';

/** search matches the instrument. */
export class ListTestResultsQueryDto extends PageQueryDto {
  @IdField('job', { description: 'test results taken on this job’s visits' })
  jobId?: string;

  @IdField('visit')
  visitId?: string;

  @IdField('site')
  siteId?: string;

  @IdField('circuit')
  circuitId?: string;
}
