import { JOB_SORTS, JOB_STATUSES, type JobSort } from '@wiretrail/core';
import { PageQueryDto } from '../../records/page-query.dto.js';
import { ChoiceField, DateTimeField, IdField } from '../../records/record-fields.js';

export const SORT_DIRECTIONS = ['asc', 'desc'] as const;

/**
 * search matches the reference, title or description, the customer's name, or the site's name, address or postcode.
 * technicianId, from and to select jobs with a visit that matches them all (the same visit).
 */
export class JobFiltersDto extends PageQueryDto {
  @IdField('site')
  siteId?: string;

  @IdField('customer')
  customerId?: string;

  @IdField('user', { description: 'jobs with a visit this technician is assigned to' })
  technicianId?: string;

  @DateTimeField({ description: 'jobs with a visit planned to start at or after this time' })
  from?: string;

  @DateTimeField({ description: 'jobs with a visit planned to start before this time' })
  to?: string;
}

export class ListJobsQueryDto extends JobFiltersDto {
  @ChoiceField(JOB_STATUSES)
  status?: (typeof JOB_STATUSES)[number];

  @ChoiceField(JOB_SORTS, { description: 'nextVisit is the earliest visit neither finished nor cancelled; created (the default) is newest first' })
  sort?: JobSort;

  @ChoiceField(SORT_DIRECTIONS, { description: 'asc unless given; created defaults to desc' })
  direction?: (typeof SORT_DIRECTIONS)[number];
}
