import { VISIT_STATUSES } from '@wiretrail/core';
import { ChoiceField, DateTimeField, IdField, IdListField } from '../../common/records/record-fields.js';

export class CreateVisitDto {
  @IdField('job', { required: true })
  jobId: string;

  @IdField('site', { required: true, description: "the job's site" })
  siteId: string;

  @IdListField('user', { description: 'the technicians assigned' })
  technicianIds?: string[] | null;

  @DateTimeField()
  plannedStart?: string | null;

  @DateTimeField()
  plannedEnd?: string | null;

  @DateTimeField()
  actualStart?: string | null;

  @DateTimeField()
  actualEnd?: string | null;

  @ChoiceField(VISIT_STATUSES)
  status?: (typeof VISIT_STATUSES)[number] | null;
}
