import { PHOTO_SUBJECTS } from '@wiretrail/core';
import { PageQueryDto } from '../../records/page-query.dto.js';
import { ChoiceField, IdField, TextField } from '../../records/record-fields.js';

/** search matches the caption. */
export class ListPhotosQueryDto extends PageQueryDto {
  @IdField('job', { description: 'photos of this job’s visits' })
  jobId?: string;

  @IdField('visit')
  visitId?: string;

  @IdField('site')
  siteId?: string;

  @IdField('area')
  areaId?: string;

  @ChoiceField(PHOTO_SUBJECTS, { description: 'the kind of record the photo is of' })
  subjectType?: string;

  @TextField(36, { description: 'the id of the record the photo is of' })
  subjectId?: string;

  @TextField(40, { description: 'photos carrying this tag' })
  tag?: string;

  @IdField('user', { description: 'photos taken by this user' })
  technicianId?: string;
}
