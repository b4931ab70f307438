import { JOB_STATUSES } from '@wiretrail/core';
import { ChoiceField, IdField, TextField } from '../../records/record-fields.js';

export class CreateJobDto {
  @IdField('site', { required: true })
  siteId: string;

  @IdField('customer', { required: true, description: 'who the job is for' })
  customerId: string;

  @TextField(40, { example: 'LED-0046' })
  reference?: string | null;

  @TextField(200, { required: true, example: 'Outside socket for the garden office' })
  title: string;

  @ChoiceField(JOB_STATUSES)
  status?: (typeof JOB_STATUSES)[number] | null;

  @TextField(20_000)
  description?: string | null;
}
