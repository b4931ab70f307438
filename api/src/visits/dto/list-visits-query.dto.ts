import { PageQueryDto } from '../../records/page-query.dto.js';
import { DateTimeField, IdField } from '../../records/record-fields.js';

/** search matches the job's reference or title, or the site's name or address. */
export class ListVisitsQueryDto extends PageQueryDto {
  @IdField('job')
  jobId?: string;

  @IdField('site')
  siteId?: string;

  @IdField('user', { description: 'visits this technician is assigned to' })
  technicianId?: string;

  @DateTimeField({ description: 'visits planned to start at or after this time' })
  from?: string;

  @DateTimeField({ description: 'visits planned to start before this time' })
  to?: string;
}
